package dev.proofrun.app.shell;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.control.Label;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * What makes a page's first showing light: it unfolds a piece per pulse and ends exactly as it was built
 * (or at once, before the window shows); the primer finds and loads every class of its list; the warm-up
 * styles and lays out its throwaway scene.
 */
@ExtendWith(ApplicationExtension.class)
class FirstShowingTest {

    private StackPane host;

    @Start
    void start(Stage stage) {
        host = new StackPane();
        stage.setScene(new Scene(host, 400, 300));
        stage.show();
    }

    @Test
    void aPageUnfoldsOnePiecePerPulseAndEndsAsBuilt() throws Exception {
        VBox page = new VBox(new Label("title"), new GridPane(), new VBox(new Label("a"), new TextField("b"),
                new TableView<String>()));
        GridPane form = (GridPane) page.getChildren().get(1);
        form.add(new Label("x"), 0, 0);
        form.add(new TextField("y"), 1, 0);
        form.add(new Label("z"), 0, 1);
        VBox card = (VBox) page.getChildren().get(2);
        List<Node> parts = List.copyOf(page.getChildren());
        List<Node> formKids = List.copyOf(form.getChildren());
        List<Node> cardKids = List.copyOf(card.getChildren());

        Unfolding u = new Unfolding();
        List<Integer> seen = new ArrayList<>();
        WaitForAsyncUtils.asyncFx(() -> {
            u.unfold(page);
            host.getChildren().add(page);
            // what is in the page at each pulse: a piece more each time
            new javafx.animation.AnimationTimer() {
                @Override
                public void handle(long now) {
                    seen.add(count(page));
                    if (!u.runningProperty().get()) {
                        stop();
                    }
                }
            }.start();
        }).get();
        WaitForAsyncUtils.waitFor(30, TimeUnit.SECONDS, () -> WaitForAsyncUtils.asyncFx(() -> !u.runningProperty().get()).get());
        WaitForAsyncUtils.waitForFxEvents();

        assertEquals(parts, WaitForAsyncUtils.asyncFx(() -> List.copyOf(page.getChildren())).get());
        assertEquals(formKids, WaitForAsyncUtils.asyncFx(() -> List.copyOf(form.getChildren())).get());
        assertEquals(cardKids, WaitForAsyncUtils.asyncFx(() -> List.copyOf(card.getChildren())).get());
        TableView<?> table = (TableView<?>) cardKids.get(2);
        assertTrue(table.isManaged(), "the table, put in unmanaged first, is managed again");
        assertEquals(javafx.scene.layout.Region.USE_COMPUTED_SIZE, table.getMinHeight(), "its own minimum height back");
        assertEquals(javafx.scene.layout.Region.USE_COMPUTED_SIZE, table.getMaxHeight(), "its own maximum height back");
        assertEquals(0, GridPane.getColumnIndex(formKids.get(0)));
        assertEquals(1, GridPane.getColumnIndex(formKids.get(1)));
        // 3 parts + 3 + 3 children = 9 nodes put back (the table then grows over a few pulses): one a pulse,
        // but a grid's row at once (row 0 has two)
        List<Integer> steps = new ArrayList<>();
        for (int i = 1; i < seen.size(); i++) {
            steps.add(seen.get(i) - seen.get(i - 1));
        }
        assertEquals(1, steps.stream().filter(d -> d == 2).count(), "the grid's first row at once: " + seen);
        assertTrue(steps.stream().allMatch(d -> d <= 2), "no more than a grid row a pulse: " + seen);
        assertEquals(10, seen.get(seen.size() - 1), "page itself + 9 nodes: " + seen);
    }

    @Test
    void unfoldNowPutsEverythingBackAtOnce() throws Exception {
        TableView<String> table = new TableView<>(javafx.collections.FXCollections.observableArrayList("a", "b"));
        VBox card = new VBox(new Label("a"), table);
        VBox page = new VBox(new Label("t"), card);
        Unfolding u = new Unfolding();
        WaitForAsyncUtils.asyncFx(() -> {
            u.unfold(page);
            u.finish();
        }).get();
        assertFalse(u.runningProperty().get());
        assertEquals(2, page.getChildren().size());
        assertEquals(List.of(card.getChildren().get(0), table), card.getChildren());
        assertTrue(table.isManaged());
        assertEquals(javafx.scene.layout.Region.USE_COMPUTED_SIZE, table.getMaxHeight());
    }

    @Test
    void theWarmUpStylesAndLaysOutItsScene() throws Exception {
        double height = WaitForAsyncUtils.asyncFx(() ->
                WarmUp.run(dev.proofrun.app.WizardApp.class.getResource(dev.proofrun.app.WizardApp.THEME).toExternalForm())).get();
        assertTrue(height > 0, "laid out: " + height);
    }

    @Test
    void thePrimerLoadsTheListedClassesOffTheFxThread() throws Exception {
        int listed = Primer.names().size();
        assertTrue(listed > 1000, "the class list is on the class path: " + listed);
        CompletableFuture<Integer> done = new CompletableFuture<>();
        Thread t = new Thread(() -> done.complete(Primer.prime()));
        t.start();
        int loaded = done.get(60, TimeUnit.SECONDS);
        // every listed class exists in the JavaFX version the build uses (the list was made with it)
        assertEquals(listed, loaded);
    }

    /** The page and every node below it that is in it now. */
    private static int count(Node n) {
        int c = 1;
        if (n instanceof javafx.scene.layout.Pane p && !(n instanceof TableView)) {
            for (Node k : p.getChildren()) {
                c += count(k);
            }
        }
        return c;
    }
}
