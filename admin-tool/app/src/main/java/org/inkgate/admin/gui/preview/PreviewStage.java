package org.inkgate.admin.gui.preview;

import java.util.Objects;
import javafx.scene.AccessibleRole;
import javafx.scene.Parent;
import javafx.scene.Scene;
import javafx.scene.control.Label;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.VBox;
import javafx.stage.Stage;
import org.inkgate.client.practice.PracticeLoad;
import org.inkgate.client.practice.ui.PracticeStage;

/**
 * The client's practice window on a preview bundle, with a banner above it saying plainly that
 * this is the test owner's preview and not a locked sitting.
 */
public final class PreviewStage {

    static final String HEADLINE = "PREVIEW for the test owner: not a locked sitting.";

    private PreviewStage() {
    }

    /** The banner's second line: what is shown and what this window does not do. */
    static String detail(String taskId, String conditionId) {
        return "Task \"" + taskId + "\" under condition \"" + conditionId + "\", built from the exam folder on this"
                + " computer and signed with a throw-away key. The machine is not locked, nothing is saved or collected,"
                + " and the practice window lists the writing tools the policy allows without switching them on."
                + " What candidates see on the day is the signed bundle on an invigilated machine; follow your"
                + " regulations before relying on this preview.";
    }

    /** Shows the practice window for {@code load} with the preview banner on top; returns the scene. */
    public static Scene show(Stage stage, PracticeLoad load, String taskId, String conditionId) {
        Scene scene = PracticeStage.show(stage, load);
        Parent practice = scene.getRoot();
        Label headline = new Label(HEADLINE);
        headline.getStyleClass().add("preview-banner-headline");
        headline.setWrapText(true);
        Label detail = new Label(detail(taskId, conditionId));
        detail.getStyleClass().add("preview-banner-detail");
        detail.setWrapText(true);
        VBox banner = new VBox(4, headline, detail);
        banner.setId("previewBanner");
        banner.getStyleClass().add("preview-banner");
        banner.setAccessibleRole(AccessibleRole.TEXT);
        banner.setAccessibleText(HEADLINE + " " + detail.getText());
        BorderPane wrapper = new BorderPane(practice);
        wrapper.setTop(banner);
        scene.setRoot(wrapper);
        scene.getStylesheets().add(Objects.requireNonNull(
                PreviewStage.class.getResource("/org/inkgate/admin/gui/admin-preview.css"),
                "the preview stylesheet is missing from the build").toExternalForm());
        stage.setTitle("PREVIEW (not a locked sitting) - " + stage.getTitle());
        return scene;
    }
}
