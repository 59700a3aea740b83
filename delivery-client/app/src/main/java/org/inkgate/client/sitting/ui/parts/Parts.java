package org.inkgate.client.sitting.ui.parts;

import javafx.geometry.Pos;
import javafx.scene.AccessibleRole;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;

/** Small building blocks every sitting screen shares, so they look and read alike. */
public final class Parts {

    private Parts() {
    }

    /** A screen's heading, read as a heading by screen readers. */
    public static Label heading(String text) {
        Label label = wrapped(text, "screen-heading");
        label.setAccessibleRole(AccessibleRole.TEXT);
        return label;
    }

    /** A wrapped paragraph. */
    public static Label text(String text) {
        return wrapped(text, "screen-text");
    }

    /** A wrapped paragraph in the quieter colour. */
    public static Label quiet(String text) {
        return wrapped(text, "quiet-note");
    }

    /** A label for a field; its mnemonic (the letter after "_") moves focus to the field. */
    public static Label fieldLabel(String text, Node field) {
        Label label = new Label(text);
        label.setMnemonicParsing(true);
        label.setLabelFor(field);
        label.getStyleClass().add("field-label");
        return label;
    }

    /** An error line under a form, empty until the flow says what is wrong. */
    public static Label errorLine(String id) {
        Label label = wrapped("", "field-error");
        label.setId(id);
        label.setAccessibleRole(AccessibleRole.TEXT);
        // no empty gap above the buttons until there is something to say
        label.managedProperty().bind(label.textProperty().isNotEmpty());
        return label;
    }

    /** The button that moves the flow on; Enter presses it. */
    public static Button primary(String id, String text, Runnable action) {
        Button button = new Button(text);
        button.setId(id);
        button.setMnemonicParsing(true);
        button.getStyleClass().add("primary");
        button.setDefaultButton(true);
        button.setOnAction(e -> action.run());
        return button;
    }

    /** A plain button. */
    public static Button plain(String id, String text, Runnable action) {
        Button button = new Button(text);
        button.setId(id);
        button.setMnemonicParsing(true);
        button.setOnAction(e -> action.run());
        return button;
    }

    /** A centred card on a scrollable screen: the layout of every form-like screen. */
    public static ScrollPane card(String id, Node... children) {
        VBox card = new VBox();
        card.getStyleClass().add("screen-card");
        card.getChildren().addAll(children);
        card.setMaxWidth(860);
        VBox screen = new VBox(card);
        screen.setId(id);
        screen.getStyleClass().add("screen");
        screen.setAlignment(Pos.TOP_CENTER);
        ScrollPane scroller = new ScrollPane(screen);
        scroller.setFitToWidth(true);
        scroller.setFocusTraversable(false);
        scroller.getStyleClass().add("screen-scroller");
        return scroller;
    }

    /**
     * A card like {@link #card} whose actions (the error line, the button that moves on) stay in a
     * bar under it, always in view: on a short window or in large print the fields scroll, the
     * way on does not go below the fold.
     */
    public static Parent cardWithActions(String id, Node actions, Node... children) {
        ScrollPane scroller = card(id, children);
        VBox bar = new VBox(actions);
        bar.getStyleClass().add("screen-card");
        bar.getStyleClass().add("screen-actions");
        bar.setMaxWidth(860);
        VBox under = new VBox(bar);
        under.getStyleClass().add("screen-actions-bar");
        under.setAlignment(Pos.TOP_CENTER);
        BorderPane page = new BorderPane(scroller);
        page.setBottom(under);
        return page;
    }

    /**
     * Puts focus on a control of a screen just shown. A control inside a scroll pane joins the scene
     * only when the pane's skin is made, at the next layout, so the request is made again then;
     * otherwise the scene gives focus to the first button it finds (the action bar's).
     */
    public static void focusWhenShown(Node control) {
        control.requestFocus();
        if (control.getScene() != null) {
            javafx.application.Platform.runLater(control::requestFocus);
            return;
        }
        control.sceneProperty().addListener(new javafx.beans.value.ChangeListener<>() {
            @Override
            public void changed(javafx.beans.value.ObservableValue<? extends javafx.scene.Scene> o,
                    javafx.scene.Scene was, javafx.scene.Scene now) {
                if (now != null) {
                    control.sceneProperty().removeListener(this);
                    control.requestFocus();
                    javafx.application.Platform.runLater(control::requestFocus);
                }
            }
        });
    }

    private static Label wrapped(String text, String styleClass) {
        Label label = new Label(text);
        label.setWrapText(true);
        label.setMinHeight(Region.USE_PREF_SIZE);
        label.getStyleClass().add(styleClass);
        return label;
    }
}
