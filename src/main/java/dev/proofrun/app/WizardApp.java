package dev.proofrun.app;

import dev.proofrun.app.session.AppHome;
import javafx.application.Application;
import javafx.scene.Scene;
import javafx.scene.control.Alert;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.stage.Stage;

/** The wizard window: the shell with its steps, our theme, and the question on close. */
public final class WizardApp extends Application {

    /** The theme's location on the class path. */
    public static final String THEME = "/dev/proofrun/app/proofrun.css";

    private Wizard wizard;

    private static String theme() {
        return WizardApp.class.getResource(THEME).toExternalForm();
    }

    @Override
    public void start(Stage stage) {
        start(stage, AppHome.standard());
    }

    /** Opens the wizard with its files under the given home (tests pass a temporary one). */
    public void start(Stage stage, AppHome home) {
        wizard = Wizard.create(home, getHostServices());
        // the demo plan of a first start is read on a worker while the window is built; it lands after
        wizard.opened();
        Scene scene = new Scene(wizard.view().root(), 1280, 800);
        scene.getStylesheets().add(theme());
        stage.setScene(scene);
        stage.setTitle("proofrun");
        stage.setMinWidth(960);
        stage.setMinHeight(640);
        stage.setOnCloseRequest(e -> {
            if (!wizard.shell().closeNeedsAnswer()) {
                return;
            }
            if (!wizard.shell().close(askOnClose(stage))) {
                e.consume();
            }
        });
        stage.show();
    }

    public Wizard wizard() {
        return wizard;
    }

    private static dev.proofrun.app.shell.CloseChoice askOnClose(Stage owner) {
        ButtonType save = new ButtonType(AppMessage.CLOSE_SAVE.english(), ButtonBar.ButtonData.YES);
        ButtonType keep = new ButtonType(AppMessage.CLOSE_KEEP.english(), ButtonBar.ButtonData.NO);
        ButtonType stay = new ButtonType(AppMessage.CLOSE_STAY.english(), ButtonBar.ButtonData.CANCEL_CLOSE);
        Alert a = new Alert(Alert.AlertType.CONFIRMATION, AppMessage.CLOSE_QUESTION.english(), save, keep, stay);
        a.setTitle(AppMessage.CLOSE_TITLE.english());
        a.setHeaderText(null);
        a.initOwner(owner);
        a.getDialogPane().setId("close-question");
        ButtonType answer = a.showAndWait().orElse(stay);
        if (answer == save) {
            return dev.proofrun.app.shell.CloseChoice.SAVE;
        }
        return answer == keep ? dev.proofrun.app.shell.CloseChoice.KEEP_DRAFT : dev.proofrun.app.shell.CloseChoice.STAY;
    }
}
