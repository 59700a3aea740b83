package org.inkgate.client.practice.ui;

import java.util.Objects;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.Scene;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.stage.Stage;
import org.inkgate.client.practice.PracticeLoad;

/** Puts the practice window together on a stage: the opened exam, or the refusal alone. */
public final class PracticeStage {

    public static final double WIDTH = 1280;
    public static final double HEIGHT = 800;
    static final String STYLESHEET = "practice.css";
    static final String REFUSED_TITLE = "Inkgate - bundle not opened (practice)";

    /** What fills the window: its content, where focus starts, and the window title. */
    private record Content(Parent root, Node firstFocus, String title) {
    }

    private PracticeStage() {
    }

    /** Fills the stage for this load, shows it and gives it focus; returns the scene. */
    public static Scene show(Stage stage, PracticeLoad load) {
        Content content = switch (Objects.requireNonNull(load, "load")) {
            case PracticeLoad.Opened opened -> exam(new PracticeViewModel(opened.exam()));
            case PracticeLoad.Refused refused -> refusal(refused.message(), stage::close);
        };
        Scene scene = new Scene(content.root(), WIDTH, HEIGHT);
        scene.getStylesheets().add(Objects.requireNonNull(PracticeStage.class.getResource(STYLESHEET),
                "the practice window's stylesheet is missing from the build").toExternalForm());
        stage.setTitle(content.title());
        stage.setMinWidth(960);
        stage.setMinHeight(640);
        stage.setScene(scene);
        stage.show();
        // since JavaFX 20 a newly shown stage may not get focus by itself
        stage.requestFocus();
        content.firstFocus().requestFocus();
        return scene;
    }

    private static Content exam(PracticeViewModel vm) {
        TaskListPane tasks = new TaskListPane(vm);
        WritingPane writing = new WritingPane(vm);
        HBox.setHgrow(writing, Priority.ALWAYS);
        HBox work = new HBox(new PromptPane(vm), writing);
        work.getStyleClass().add("work-area");

        BorderPane root = new BorderPane();
        root.getStyleClass().add("practice-root");
        root.setTop(new VBox(new PracticeBanner(), new ExamHeader(vm)));
        root.setLeft(tasks);
        root.setCenter(work);
        return new Content(root, tasks.list(), vm.windowTitle());
    }

    private static Content refusal(String message, Runnable close) {
        RefusalView refusal = new RefusalView(message, close);
        BorderPane root = new BorderPane();
        root.getStyleClass().addAll("practice-root", "refused");
        root.setTop(new PracticeBanner(""));
        root.setCenter(refusal);
        return new Content(root, refusal.closeButton(), REFUSED_TITLE);
    }
}
