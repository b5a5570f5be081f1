package dev.proofrun.app.shell;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.List;
import java.util.function.BooleanSupplier;
import javafx.animation.AnimationTimer;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.scene.Node;
import javafx.scene.control.Control;
import javafx.scene.control.ListView;
import javafx.scene.control.TableView;
import javafx.scene.layout.Pane;

/**
 * Puts a page into the window a piece at a time, one piece per pulse, so that no single pulse has to make
 * the skins, apply the style sheet and lay out a whole page. The pieces are the page's parts (the cards a
 * step view stacks) and, inside a part that is a pane, that part's own children (a grid's a row at a
 * time); each goes back to the place it had, in order (a table or list a row at a time, see {@link #put}). The first pulse shows
 * the page's frame, the rest follow within a few frames.
 *
 * <p>Only the two outer levels are taken apart: the step views do not change those lists after they are
 * built (what they fill in later lies deeper), so nothing here races with a view.
 */
final class Unfolding {

    /** Rows a table or list grows by in one pulse on its first showing. */
    static final int ROWS_PER_PULSE = 1;

    /** A piece of work for one pulse; true when it is done, false to be run again in the next pulse. */
    private final Deque<BooleanSupplier> pieces = new ArrayDeque<>();
    private final ReadOnlyBooleanWrapper running = new ReadOnlyBooleanWrapper(this, "running", false);
    private final AnimationTimer timer = new AnimationTimer() {
        @Override
        public void handle(long now) {
            BooleanSupplier next = pieces.peek();
            if (next != null && next.getAsBoolean()) {
                pieces.poll();
            }
            if (pieces.isEmpty()) {
                stop();
                running.set(false);
            }
        }
    };

    /** True while pieces of a page are still to be put back. */
    ReadOnlyBooleanProperty runningProperty() {
        return running.getReadOnlyProperty();
    }

    /**
     * Takes the page's parts out (and the children of each part that is a pane) and puts them back one per
     * pulse from the next pulse on. Call before the page goes into the scene.
     */
    void unfold(Pane page) {
        List<Node> parts = List.copyOf(page.getChildren());
        if (parts.isEmpty()) {
            return;
        }
        page.getChildren().clear();
        for (Node part : parts) {
            List<Node> inner = part instanceof Pane p ? List.copyOf(p.getChildren()) : List.of();
            if (!inner.isEmpty()) {
                ((Pane) part).getChildren().clear();
            }
            put(page, part);
            if (part instanceof javafx.scene.layout.GridPane grid) {
                putByRows(grid, inner);
                continue;
            }
            for (Node child : inner) {
                put((Pane) part, child);
            }
        }
        running.set(true);
        timer.start();
    }

    /**
     * A form's children go back a row per pulse: each child added to a grid makes it measure all its
     * children again, so one per pulse made a long form cost more in all than the form at once.
     */
    private void putByRows(javafx.scene.layout.GridPane grid, List<Node> children) {
        int i = 0;
        while (i < children.size()) {
            Integer row = javafx.scene.layout.GridPane.getRowIndex(children.get(i));
            List<Node> same = new java.util.ArrayList<>();
            while (i < children.size() && java.util.Objects.equals(
                    javafx.scene.layout.GridPane.getRowIndex(children.get(i)), row)) {
                same.add(children.get(i++));
            }
            pieces.add(() -> {
                grid.getChildren().addAll(same);
                return true;
            });
        }
    }

    /**
     * Queues putting the node back into its pane. A table or list comes in unmanaged first (nothing gives it
     * a size: its skin and style are made, no cells), then it is managed again at the height of a few
     * rows and grows by {@value #ROWS_PER_PULSE} row a pulse to the height it wants: its cells are made a
     * row at a time. Made in one pulse, the cells of one table held the FX thread as long as the rest
     * of a page.
     */
    private void put(Pane parent, Node n) {
        if (!(n instanceof TableView<?> || n instanceof ListView<?>)
                || !n.isManaged() || n.managedProperty().isBound()) {
            pieces.add(() -> {
                parent.getChildren().add(n);
                return true;
            });
            return;
        }
        Control list = (Control) n;
        pieces.add(() -> {
            list.setManaged(false);
            parent.getChildren().add(list);
            return true;
        });
        if (list.minHeightProperty().isBound() || list.maxHeightProperty().isBound()) {
            pieces.add(() -> {
                list.setManaged(true);
                return true;
            });
            return;
        }
        double min = list.getMinHeight();
        double max = list.getMaxHeight();
        double step = Em.of(Tables.ROW_EM * ROWS_PER_PULSE);
        double[] height = {0};
        pieces.add(() -> {
            height[0] += step;
            list.setManaged(true);
            if (height[0] >= list.prefHeight(-1)) {
                list.setMinHeight(min);
                list.setMaxHeight(max);
                return true;
            }
            list.setMinHeight(height[0]);
            list.setMaxHeight(height[0]);
            return false;
        });
    }

    /**
     * Puts back at once whatever is still waiting: for the page a window shows first, before the window
     * shows (nobody waits on a window not yet shown, and its first frame is then drawn complete).
     */
    void finish() {
        while (!pieces.isEmpty()) {
            if (pieces.peek().getAsBoolean()) {
                pieces.poll();
            }
        }
        timer.stop();
        running.set(false);
    }
}
