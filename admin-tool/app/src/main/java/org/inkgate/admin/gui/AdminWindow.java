package org.inkgate.admin.gui;

import java.util.List;
import java.util.Objects;
import javafx.geometry.Insets;
import javafx.scene.Scene;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.ScrollPane;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyCodeCombination;
import javafx.scene.input.KeyCombination;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.stage.Stage;
import org.inkgate.admin.gui.analysis.AnalysisModel;
import org.inkgate.admin.gui.analysis.AnalysisView;
import org.inkgate.admin.gui.bundle.BundleModel;
import org.inkgate.admin.gui.bundle.BundleView;
import org.inkgate.admin.gui.collect.CollectModel;
import org.inkgate.admin.gui.collect.CollectView;
import org.inkgate.admin.gui.exam.ExamCheckModel;
import org.inkgate.admin.gui.exam.ExamCheckView;
import org.inkgate.admin.gui.export.ExportModel;
import org.inkgate.admin.gui.export.ExportView;
import org.inkgate.admin.gui.forms.FormsModel;
import org.inkgate.admin.gui.forms.FormsView;
import org.inkgate.admin.gui.missing.MissingModel;
import org.inkgate.admin.gui.missing.MissingView;
import org.inkgate.admin.gui.rating.DeskStep;
import org.inkgate.admin.gui.rating.DeskStepModel;
import org.inkgate.admin.gui.ratingadmin.RatingAdminModel;
import org.inkgate.admin.gui.ratingadmin.RatingAdminView;

/**
 * The admin window: the steps in a list on the left (Ctrl+1 to Ctrl+9 jump to them), the chosen
 * step in the middle, and a status line with progress at the bottom.
 */
public final class AdminWindow {

    public static final double WIDTH = 1280;
    public static final double HEIGHT = 800;
    static final String STYLESHEET = "admin.css";

    private final ListView<Step> steps;
    private final BorderPane root = new BorderPane();

    private AdminWindow(AdminSession session) {
        Work work = session.work();
        List<Step> all = List.of(
                new ExamCheckView(new ExamCheckModel(session)),
                new FormsView(new FormsModel(session)),
                new BundleView(new BundleModel(session), work),
                new CollectView(new CollectModel(session), work),
                new MissingView(new MissingModel(session)),
                new DeskStep(new DeskStepModel(session), work),
                new RatingAdminView(new RatingAdminModel(session), work),
                new ExportView(new ExportModel(session), work),

                new AnalysisView(new AnalysisModel(session), work));
        steps = new ListView<>(javafx.collections.FXCollections.observableArrayList(all));
        steps.setId("steps");
        steps.setAccessibleText("Steps");
        steps.getStyleClass().add("step-list");
        steps.setPrefWidth(264);
        steps.setCellFactory(l -> new ListCell<>() {
            @Override
            protected void updateItem(Step step, boolean empty) {
                super.updateItem(step, empty);
                setText(empty || step == null ? null : step.title());
            }
        });
        ScrollPane center = new ScrollPane();
        center.setFitToWidth(true);
        center.getStyleClass().add("step-scroll");
        steps.getSelectionModel().selectedItemProperty().addListener((o, was, step) -> {
            if (step != null) {
                center.setContent(step.view());
            }
        });
        steps.getSelectionModel().selectFirst();

        Label title = new Label("Inkgate admin");
        title.getStyleClass().add("app-title");
        Label examName = new Label();
        examName.setId("examName");
        examName.getStyleClass().add("app-exam");
        examName.textProperty().bind(javafx.beans.binding.Bindings.createStringBinding(() -> session.exam().get() == null
                ? "No exam checked yet" : session.exam().get().title() + "  (" + session.exam().get().examId() + ")",
                session.exam()));
        HBox header = new HBox(24, title, examName);
        header.getStyleClass().add("app-header");

        ProgressBar bar = new ProgressBar();
        bar.setId("progress");
        bar.setAccessibleText("Progress of the running step");
        bar.progressProperty().bind(work.progress());
        bar.visibleProperty().bind(work.busy());
        bar.setPrefWidth(260);
        Label status = new Label();
        status.setId("status");
        status.textProperty().bind(work.message());
        HBox.setHgrow(status, Priority.ALWAYS);
        HBox statusBar = new HBox(16, status, bar);
        statusBar.getStyleClass().add("status-bar");

        root.getStyleClass().add("admin-root");
        root.setTop(header);
        root.setLeft(new VBox(steps));
        VBox.setVgrow(steps, Priority.ALWAYS);
        root.setCenter(center);
        root.setBottom(statusBar);
        BorderPane.setMargin(center, new Insets(0));
    }

    /** Fills the stage with the admin window, shows it and gives it focus; returns the scene. */
    public static Scene show(Stage stage, AdminSession session) {
        AdminWindow window = new AdminWindow(session);
        Scene scene = new Scene(window.root, WIDTH, HEIGHT);
        scene.getStylesheets().add(Objects.requireNonNull(AdminWindow.class.getResource(STYLESHEET),
                "the admin window's stylesheet is missing from the build").toExternalForm());
        for (int i = 0; i < window.steps.getItems().size(); i++) {
            int index = i;
            scene.getAccelerators().put(new KeyCodeCombination(KeyCode.getKeyCode(Integer.toString(i + 1)),
                    KeyCombination.SHORTCUT_DOWN), () -> window.select(index));
        }
        stage.setTitle("Inkgate admin");
        stage.setMinWidth(960);
        stage.setMinHeight(640);
        stage.setScene(scene);
        stage.show();
        // since JavaFX 20 a newly shown stage may not get focus by itself
        stage.requestFocus();
        window.steps.requestFocus();
        return scene;
    }

    private void select(int index) {
        steps.getSelectionModel().select(index);
        steps.getItems().get(index).firstFocus().requestFocus();
    }
}
