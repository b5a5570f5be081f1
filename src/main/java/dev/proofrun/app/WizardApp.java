package dev.proofrun.app;

import javafx.application.Application;
import javafx.scene.Scene;
import javafx.scene.control.Label;
import javafx.scene.layout.StackPane;
import javafx.stage.Stage;

/** The wizard window. A placeholder until the wizard steps land. */
public final class WizardApp extends Application {

    @Override
    public void start(Stage stage) {
        Label label = new Label("proofrun: the wizard is under construction. Use the command line: proofrun --help");
        label.setId("placeholder");
        stage.setScene(new Scene(new StackPane(label), 1000, 700));
        stage.setTitle("proofrun");
        stage.show();
    }
}
