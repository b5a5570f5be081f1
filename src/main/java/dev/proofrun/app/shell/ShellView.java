package dev.proofrun.app.shell;

import dev.proofrun.app.AppMessage;
import java.util.ArrayList;
import java.util.List;
import javafx.animation.PauseTransition;
import javafx.beans.binding.Bindings;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.Tooltip;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyCodeCombination;
import javafx.scene.input.KeyCombination;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import javafx.util.Duration;

/**
 * The window's frame: the step rail on the left, the current step in the middle, and the footer with
 * what is missing, the status line and Back / Next. Keys: Alt+→ / Alt+← (also Ctrl+Page Down / Up) move
 * between steps, Ctrl+1 … Ctrl+7 jump to a step, Tab moves through the fields.
 */
public final class ShellView {

    private final ShellViewModel vm;
    private final List<StepView> views;
    private final BorderPane root = new BorderPane();
    private final StackPane stage = new StackPane();
    private final List<Button> railButtons = new ArrayList<>();
    private boolean railPending;
    private final java.util.Map<Integer, ScrollPane> pages = new java.util.HashMap<>();
    private final PauseTransition idle = new PauseTransition(IDLE_BEFORE_NEXT_PAGE);

    /**
     * How long nobody may type or click, after a step comes on screen, before the page after it is built.
     * Building a page (its controls' skins, styles and layout) holds the FX thread for one pulse; done while
     * nobody waits, the step's first showing later is only a change of what is visible.
     */
    static final Duration IDLE_BEFORE_NEXT_PAGE = Duration.millis(400);

    public ShellView(ShellViewModel vm, List<StepView> views) {
        if (views.size() != vm.steps().size()) {
            throw new IllegalArgumentException("one view per step is needed");
        }
        this.vm = vm;
        this.views = List.copyOf(views);
        root.getStyleClass().add("pr-shell");
        root.setLeft(rail());
        root.setCenter(stage);
        root.setBottom(footer());
        stage.getStyleClass().add("pr-stage");
        idle.setOnFinished(e -> buildAhead(vm.currentProperty().get() + 1));
        root.addEventFilter(javafx.scene.input.InputEvent.ANY, e -> {
            if (idle.getStatus() == javafx.animation.Animation.Status.RUNNING) {
                idle.playFromStart();
            }
        });
        show(vm.currentProperty().get());
        vm.currentProperty().addListener((obs, was, now) -> show(now.intValue()));
        keys();
        autosave();
    }

    public Parent root() {
        return root;
    }

    private Node rail() {
        VBox rail = new VBox();
        rail.getStyleClass().add("pr-rail");
        Label brand = new Label("proofrun");
        brand.getStyleClass().add("pr-brand");
        rail.getChildren().add(brand);
        for (int i = 0; i < vm.steps().size(); i++) {
            StepViewModel s = vm.steps().get(i);
            int index = i;
            Button b = new Button((i + 1) + "  " + s.title());
            b.setId("rail-" + i);
            b.getStyleClass().add("pr-rail-step");
            b.setMaxWidth(Double.MAX_VALUE);
            b.setAlignment(Pos.CENTER_LEFT);
            b.setTooltip(new Tooltip(s.hint() + "  (Ctrl+" + (i + 1) + ")"));
            // Tab stays in the step and the footer; the rail is one key away (Ctrl+1 … Ctrl+7)
            b.setFocusTraversable(false);
            b.setOnAction(e -> vm.goTo(index));
            s.completeBinding().addListener(obs -> restyleRail());
            railButtons.add(b);
            rail.getChildren().add(b);
        }
        Region fill = new Region();
        VBox.setVgrow(fill, Priority.ALWAYS);
        Label dirty = new Label(AppMessage.DIRTY_MARK.english());
        dirty.setId("dirty-mark");
        dirty.getStyleClass().add("pr-dirty");
        dirty.visibleProperty().bind(vm.session().draft().dirtyProperty());
        rail.getChildren().addAll(fill, dirty);
        styleRail();
        return rail;
    }

    /**
     * Restyles the rail once, after the event that changed a step's completeness: one background answer or
     * one edit can change several inputs of a step in a row, and each would make the step check itself.
     */
    private void restyleRail() {
        if (!railPending) {
            railPending = true;
            javafx.application.Platform.runLater(() -> {
                railPending = false;
                styleRail();
            });
        }
    }

    private void styleRail() {
        int cur = vm.currentProperty().get();
        for (int i = 0; i < railButtons.size(); i++) {
            Button b = railButtons.get(i);
            String state = i == cur ? "pr-rail-current"
                    : vm.steps().get(i).completeBinding().get() ? "pr-rail-done" : "pr-rail-open";
            if (b.getStyleClass().contains(state)) {
                continue; // a changed style class makes the button's style be worked out again
            }
            b.getStyleClass().removeAll("pr-rail-current", "pr-rail-done", "pr-rail-open");
            b.getStyleClass().add(state);
        }
    }

    private Node footer() {
        Label missing = new Label();
        missing.setId("missing");
        missing.getStyleClass().add("pr-missing");
        missing.textProperty().bind(vm.missingBinding());
        missing.setWrapText(true);
        Label status = new Label();
        status.setId("status");
        status.getStyleClass().add("pr-status");
        status.textProperty().bind(vm.statusProperty());
        VBox texts = new VBox(missing, status);
        texts.getStyleClass().add("pr-footer-texts");
        HBox.setHgrow(texts, Priority.ALWAYS);
        Button back = new Button("_Back");
        back.setId("back");
        back.setMnemonicParsing(true);
        back.disableProperty().bind(vm.canGoBackBinding().not());
        back.setOnAction(e -> vm.back());
        Button next = new Button("_Next");
        next.setId("next");
        next.setMnemonicParsing(true);
        next.getStyleClass().add("pr-primary");
        next.disableProperty().bind(vm.canGoForwardBinding().not());
        next.setOnAction(e -> vm.next());
        next.visibleProperty().bind(Bindings.createBooleanBinding(
                () -> vm.currentProperty().get() < vm.steps().size() - 1, vm.currentProperty()));
        HBox bar = new HBox(texts, back, next);
        bar.getStyleClass().add("pr-footer");
        bar.setAlignment(Pos.CENTER_LEFT);
        return bar;
    }

    /**
     * Shows the step's page. A page is put in the scene on its first showing (or earlier, built ahead while
     * the user was idle, see {@link #IDLE_BEFORE_NEXT_PAGE}) and then stays there, hidden while another step
     * is shown: showing it again does not make its skins or apply the style sheet to it again (a page taken
     * out of the scene and put back gets all its CSS again).
     */
    private void show(int index) {
        StepView v = views.get(index);
        ScrollPane shown = pages.get(index);
        if (shown == null) {
            shown = page(index, v);
            pages.put(index, shown);
            stage.getChildren().add(shown);
        }
        for (Node p : stage.getChildren()) {
            boolean current = p == shown;
            p.setVisible(current);
            p.setManaged(current);
        }
        styleRail();
        // a step comes back at its top, its title in view, wherever it was left scrolled
        shown.setVvalue(shown.getVmin());
        focusFirst(index, v.firstFocus());
        idle.playFromStart();
    }

    /**
     * Builds the step's page, hidden, if it has not been shown yet: put in the scene at the size of the shown
     * page, it is styled and laid out in the next pulse, so that its first showing needs no skins, styles or
     * layout of its own.
     */
    private void buildAhead(int index) {
        if (index >= views.size() || pages.containsKey(index) || root.getScene() == null) {
            return; // the last step, a page already built, or a window being closed
        }
        ScrollPane ahead = page(index, views.get(index));
        pages.put(index, ahead);
        ahead.setVisible(false);
        ahead.setManaged(false);
        stage.getChildren().add(ahead);
        // unmanaged, it keeps this size; the next pulse styles and lays it out like any node of the scene
        ahead.resize(stage.getWidth(), stage.getHeight());
    }

    private ScrollPane page(int index, StepView v) {
        StepViewModel s = vm.steps().get(index);
        Label title = new Label((index + 1) + " · " + s.title());
        title.getStyleClass().add("pr-step-title");
        Label hint = new Label(s.hint());
        hint.getStyleClass().add("pr-step-hint");
        hint.setWrapText(true);
        VBox page = new VBox(title, hint, v.root());
        page.getStyleClass().add("pr-page");
        page.setId("page-" + index);
        ScrollPane scroll = new ScrollPane(page);
        scroll.setFitToWidth(true);
        scroll.getStyleClass().add("pr-scroll");
        return scroll;
    }

    /**
     * Puts the focus in the step's first field. The scroll pane adds the page to the scene only when its
     * skin is made, in the next pulse, and that pulse first hands the focus of the removed page to the
     * footer; so the focus is asked for again once the field is in the scene, after that pulse.
     */
    private void focusFirst(int index, Node focus) {
        Runnable ask = () -> {
            if (vm.currentProperty().get() == index && focus.getScene() != null) {
                focus.requestFocus();
                ScrollPane page = pages.get(index);
                if (page != null) {
                    page.setVvalue(page.getVmin());
                }
            }
        };
        ask.run();
        javafx.beans.value.ChangeListener<javafx.scene.Scene> attached = new javafx.beans.value.ChangeListener<>() {
            @Override
            public void changed(javafx.beans.value.ObservableValue<? extends javafx.scene.Scene> o,
                    javafx.scene.Scene was, javafx.scene.Scene now) {
                if (now != null) {
                    focus.sceneProperty().removeListener(this);
                    javafx.application.Platform.runLater(ask);
                }
            }
        };
        if (focus.getScene() == null) {
            focus.sceneProperty().addListener(attached);
        } else {
            javafx.application.Platform.runLater(ask);
        }
    }

    private void keys() {
        root.sceneProperty().addListener((obs, was, scene) -> {
            if (scene == null) {
                return;
            }
            scene.getAccelerators().put(new KeyCodeCombination(KeyCode.RIGHT, KeyCombination.ALT_DOWN), vm::next);
            scene.getAccelerators().put(new KeyCodeCombination(KeyCode.LEFT, KeyCombination.ALT_DOWN), vm::back);
            scene.getAccelerators().put(new KeyCodeCombination(KeyCode.PAGE_DOWN, KeyCombination.SHORTCUT_DOWN), vm::next);
            scene.getAccelerators().put(new KeyCodeCombination(KeyCode.PAGE_UP, KeyCombination.SHORTCUT_DOWN), vm::back);
            KeyCode[] digits = {KeyCode.DIGIT1, KeyCode.DIGIT2, KeyCode.DIGIT3, KeyCode.DIGIT4, KeyCode.DIGIT5,
                KeyCode.DIGIT6, KeyCode.DIGIT7, KeyCode.DIGIT8, KeyCode.DIGIT9};
            for (int i = 0; i < Math.min(digits.length, vm.steps().size()); i++) {
                int index = i;
                scene.getAccelerators().put(new KeyCodeCombination(digits[i], KeyCombination.SHORTCUT_DOWN), () -> vm.goTo(index));
            }
        });
    }

    /** Autosave two seconds after the last edit. */
    private void autosave() {
        PauseTransition quiet = new PauseTransition(Duration.seconds(2));
        quiet.setOnFinished(e -> vm.autosave());
        vm.session().draft().editsProperty().addListener((obs, was, now) -> quiet.playFromStart());
    }
}
