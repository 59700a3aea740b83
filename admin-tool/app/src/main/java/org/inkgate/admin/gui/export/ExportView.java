package org.inkgate.admin.gui.export;

import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.Label;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;
import org.inkgate.admin.gui.Fields;
import org.inkgate.admin.gui.Step;
import org.inkgate.admin.gui.Work;

/** The export step: tidy CSV, QTI results and xAPI statements into a folder, and what was written. */
public final class ExportView implements Step {

    static final String TITLE = "8. Exports";

    private final VBox root;
    private final Node storeField;

    public ExportView(ExportModel model, Work work) {
        GridPane grid = Fields.grid();
        storeField = org.inkgate.admin.gui.StoreField.row(grid, 0, "exportStore", "Results store", model.store(),
                model.storePasswordFile(), Fields.Choose.OPEN_FILE);
        Fields.pathRow(grid, 1, "exportFolder", "Export folder", model.folder(), Fields.Choose.FOLDER);
        TextField exam = new TextField();
        exam.setId("exportExam");
        exam.setAccessibleText("Exam id (blank for every exam in the store)");
        exam.setPromptText("every exam in the store");
        exam.textProperty().bindBidirectional(model.examId());
        Fields.row(grid, 2, "Exam id", exam);
        TextField base = new TextField();
        base.setId("xapiBase");
        base.setAccessibleText("xAPI IRI base");
        base.textProperty().bindBidirectional(model.xapiBase());
        Fields.row(grid, 3, "xAPI IRI base", base);
        CheckBox light = new CheckBox("Leave per-keystroke statements out of the xAPI file");
        light.setId("xapiLight");
        light.setAccessibleText("Leave per-keystroke statements out of the xAPI file");
        light.selectedProperty().bindBidirectional(model.xapiLight());
        grid.add(light, 1, 4);
        Button export = new Button("Export");
        export.setId("export");
        export.setAccessibleText("Export the results store");
        export.disableProperty().bind(work.busy());
        export.setOnAction(e -> model.export());
        export.getProperties().put(ExportModel.class, model); // lets a test hold the export at a part
        Button cancel = new Button("Cancel");
        cancel.setId("cancelExport");
        cancel.setAccessibleText("Cancel the running export; nothing of it is kept unless its files are already moving into place");
        cancel.disableProperty().bind(model.running().not());
        cancel.setOnAction(e -> model.cancel());
        ProgressBar bar = new ProgressBar();
        bar.setId("exportProgress");
        bar.setAccessibleText("Progress of the export");
        bar.progressProperty().bind(model.progress());
        bar.setPrefWidth(280);
        Label step = new Label();
        step.setId("exportStep");
        step.setAccessibleText("The export's step in hand");
        step.textProperty().bind(model.step());
        step.setWrapText(true);
        HBox progress = new HBox(12, bar, step);
        progress.visibleProperty().bind(model.running());
        progress.managedProperty().bind(model.running());
        Label written = Fields.result("exportWritten", "What the export wrote", model.written());
        root = new VBox(14, Fields.heading(TITLE),
                Fields.note("Per exam, into FOLDER/EXAM-ID: tidy CSV (csv/, see docs/data-dictionary.md), QTI 3.0"
                        + " results per response package (qti-results/, with final scores once ratings exist) and xAPI"
                        + " statements (xapi-statements.jsonl). The same files as inkgate-admin export. The files are moved into the"
                        + " folder only when the whole export is written: a cancelled or failed export leaves nothing. Cancel"
                        + " pressed while the files are already moving into place comes too late: the export then completes"
                        + " and says so. Use an IRI base"
                        + " under a domain you control before sharing the xAPI file."),
                grid, new HBox(12, export, cancel), progress, written);
        root.getStyleClass().add("step");
    }

    @Override
    public String title() {
        return TITLE;
    }

    @Override
    public Node view() {
        return root;
    }

    @Override
    public Node firstFocus() {
        return storeField;
    }
}
