package org.inkgate.admin.gui.rating;

import java.util.Objects;
import javafx.scene.Scene;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyCodeCombination;
import javafx.scene.input.KeyCombination;
import javafx.scene.layout.StackPane;
import javafx.stage.Stage;

/**
 * The rating desk window: the sign-in screen until a rater signs in, then their desk. Closing the
 * window waits for the last draft to reach the store.
 */
public final class DeskWindow {

    public static final double WIDTH = 1280;
    public static final double HEIGHT = 800;
    static final String STYLESHEET = "desk.css";
    static final String TITLE = "Inkgate rating desk";

    private DeskWindow() {
    }

    /** Fills {@code stage} with the desk over {@code model}, shows it with focus on the rater list; returns the scene. */
    public static Scene show(Stage stage, DeskModel model) {
        return show(stage, model, () -> { });
    }

    /**
     * As {@link #show(Stage, DeskModel)}; when the window closes, the last drafts are written and
     * then {@code afterClose} runs (the caller closes the store there).
     */
    public static Scene show(Stage stage, DeskModel model, Runnable afterClose) {
        SignInView signIn = new SignInView(model);
        ScoringView scoring = new ScoringView(model);
        StackPane root = new StackPane();
        root.getStyleClass().add("desk");
        Runnable choose = () -> {
            boolean signedIn = model.rater().get() != null;
            root.getChildren().setAll(signedIn ? scoring.view() : signIn.view());
            // make the skins now, so nodes inside scroll panes are in the scene before focus moves to them
            root.applyCss();
            root.layout();
            DeskKeys.focusWhenShown(signedIn ? scoring.firstFocus() : signIn.firstFocus());
        };
        model.rater().addListener((o, was, now) -> choose.run());
        choose.run();

        Scene scene = new Scene(root, WIDTH, HEIGHT);
        scene.getStylesheets().add(Objects.requireNonNull(DeskWindow.class.getResource(STYLESHEET),
                "the rating desk's stylesheet is missing from the build").toExternalForm());
        scene.getAccelerators().put(new KeyCodeCombination(KeyCode.ENTER, KeyCombination.SHORTCUT_DOWN),
                scoring::submitFromKeyboard);
        scene.getAccelerators().put(new KeyCodeCombination(KeyCode.PAGE_DOWN, KeyCombination.SHORTCUT_DOWN),
                () -> model.move(+1));
        scene.getAccelerators().put(new KeyCodeCombination(KeyCode.PAGE_UP, KeyCombination.SHORTCUT_DOWN),
                () -> model.move(-1));
        stage.setTitle(TITLE);
        stage.setMinWidth(1024);
        stage.setMinHeight(640);
        stage.setScene(scene);
        stage.setOnHidden(e -> {
            model.close();
            afterClose.run();
        });
        stage.show();
        // since JavaFX 20 a newly shown stage may not get focus by itself
        stage.requestFocus();
        signIn.firstFocus().requestFocus();
        model.loadRaters();
        return scene;
    }
}
