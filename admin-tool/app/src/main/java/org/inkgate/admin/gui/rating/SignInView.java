package org.inkgate.admin.gui.rating;

import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.input.KeyCode;
import javafx.scene.input.MouseButton;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import org.inkgate.admin.core.rating.RatingDesk.Rater;

/** The sign-in screen: the rater picks their own id from the exam's raters; no password (see the rater guide). */
final class SignInView {

    static final String NO_PASSWORD = "There is no password. Inkgate does not check who signs in: choose only your own"
            + " rater id, and follow the test owner's rules on who may rate and where.";

    private final StackPane root;
    private final ListView<Rater> list;

    SignInView(DeskModel model) {
        list = new ListView<>(model.raters());
        list.setId("raters");
        list.setAccessibleText("Rater ids: choose your own");
        list.getStyleClass().add("rater-list");
        list.setPrefHeight(260);
        list.setCellFactory(l -> new ListCell<>() {
            @Override
            protected void updateItem(Rater rater, boolean empty) {
                super.updateItem(rater, empty);
                setText(empty || rater == null ? null : text(rater));
            }
        });
        list.setOnKeyPressed(e -> {
            if (e.getCode() == KeyCode.ENTER) {
                model.signIn(list.getSelectionModel().getSelectedItem());
                e.consume();
            }
        });
        list.setOnMouseClicked(e -> {
            if (e.getButton() == MouseButton.PRIMARY && e.getClickCount() == 2) {
                model.signIn(list.getSelectionModel().getSelectedItem());
            }
        });
        model.raters().addListener((javafx.collections.ListChangeListener<Rater>) c -> {
            if (list.getSelectionModel().isEmpty() && !model.raters().isEmpty()) {
                list.getSelectionModel().selectFirst();
            }
        });

        Button signIn = new Button("Sign in");
        signIn.setId("signIn");
        signIn.getStyleClass().add("primary");
        signIn.setOnAction(e -> model.signIn(list.getSelectionModel().getSelectedItem()));
        DeskKeys.enterFires(signIn);

        Label heading = new Label("Rating desk");
        heading.getStyleClass().add("desk-heading");
        Label choose = new Label("Your rater id");
        choose.setLabelFor(list);
        choose.getStyleClass().add("field-label");
        Label how = new Label("Choose your id with the arrow keys, then press Enter or Sign in. Your queue opens where"
                + " you stopped last time.");
        how.setWrapText(true);
        Label note = new Label(NO_PASSWORD);
        note.setId("noPassword");
        note.setWrapText(true);
        note.getStyleClass().add("desk-note");
        Label problem = new Label();
        problem.setId("signInProblem");
        problem.setWrapText(true);
        problem.getStyleClass().add("desk-problem");
        problem.textProperty().bind(model.problem());
        problem.visibleProperty().bind(model.problem().isNotEmpty());
        problem.managedProperty().bind(problem.visibleProperty());

        VBox card = new VBox(14, heading, how, choose, list, signIn, problem, note);
        card.getStyleClass().add("sign-in-card");
        card.setMaxWidth(520);
        card.setMaxHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
        root = new StackPane(card);
        root.getStyleClass().add("sign-in");
        StackPane.setAlignment(card, Pos.CENTER);
    }

    static String text(Rater rater) {
        return rater.label() == null || rater.label().isBlank() || rater.label().equals(rater.id())
                ? rater.id() : rater.id() + "  (" + rater.label() + ")";
    }

    Node view() {
        return root;
    }

    Node firstFocus() {
        return list;
    }
}
