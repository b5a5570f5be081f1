package dev.proofrun.app.shell;

import javafx.scene.Node;

/** A step's view: builds its nodes once and binds them to its view-model. */
public interface StepView {

    Node root();

    /** The node that takes the keyboard focus when the step comes on screen. */
    default Node firstFocus() {
        return root();
    }
}
