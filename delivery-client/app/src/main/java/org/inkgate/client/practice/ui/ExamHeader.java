package org.inkgate.client.practice.ui;

import javafx.geometry.Pos;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import org.inkgate.client.practice.PracticeForm;

/** Exam title, signer fingerprint and the form chooser. */
final class ExamHeader extends HBox {

    ExamHeader(PracticeViewModel vm) {
        getStyleClass().add("exam-header");
        setAlignment(Pos.CENTER_LEFT);

        Label title = new Label(vm.examTitle());
        title.setId("examTitle");
        title.getStyleClass().add("exam-title");
        title.setWrapText(true);
        Label signer = new Label(vm.signerText());
        signer.setId("signerText");
        signer.getStyleClass().add("signer-text");
        signer.setWrapText(true);
        VBox titles = new VBox(4, title, signer);
        HBox.setHgrow(titles, Priority.ALWAYS);
        titles.setMaxWidth(Double.MAX_VALUE);

        Region gap = new Region();
        gap.setMinWidth(24);
        getChildren().addAll(titles, gap, formChooser(vm));
    }

    private static VBox formChooser(PracticeViewModel vm) {
        ComboBox<PracticeForm> chooser = new ComboBox<>(vm.forms());
        chooser.setId("formChooser");
        chooser.valueProperty().bindBidirectional(vm.selectedFormProperty());
        chooser.setAccessibleText("Form to practise");
        chooser.setMinWidth(160);
        Label label = new Label("_Form to practise");
        label.setMnemonicParsing(true);
        label.setLabelFor(chooser);
        label.getStyleClass().add("field-label");
        VBox box = new VBox(6, label, chooser);
        box.setMinWidth(Region.USE_PREF_SIZE);
        return box;
    }
}
