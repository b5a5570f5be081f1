package dev.proofrun.app.shell;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.List;
import javafx.animation.AnimationTimer;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.scene.Node;
import javafx.scene.layout.Pane;

/**
 * Puts a page into the window a piece at a time, one piece per pulse, so that no single pulse has to make
 * the skins, apply the style sheet and lay out a whole page. The pieces are the page's parts (the cards a
 * step view stacks) and, inside a part that is a pane, that part's own children; each goes back to the
 * place it had, in order. The first pulse shows the page's frame, the rest follow within a few frames.
 *
 * <p>Only the two outer levels are taken apart: the step views do not change those lists after they are
 * built (what they fill in later lies deeper), so nothing here races with a view.
 */
final class Unfolding {

    private final Deque<Runnable> pieces = new ArrayDeque<>();
    private final ReadOnlyBooleanWrapper running = new ReadOnlyBooleanWrapper(this, "running", false);
    private final AnimationTimer timer = new AnimationTimer() {
        @Override
        public void handle(long now) {
            Runnable next = pieces.poll();
            if (next != null) {
                next.run();
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
            pieces.add(() -> page.getChildren().add(part));
            for (Node child : inner) {
                pieces.add(() -> ((Pane) part).getChildren().add(child));
            }
        }
        running.set(true);
        timer.start();
    }

    /** Puts back at once whatever is still waiting (used when the window must be complete now). */
    void finish() {
        while (!pieces.isEmpty()) {
            pieces.poll().run();
        }
        timer.stop();
        running.set(false);
    }
}
