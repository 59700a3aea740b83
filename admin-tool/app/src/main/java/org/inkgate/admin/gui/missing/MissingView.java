package org.inkgate.admin.gui.missing;

import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.VBox;
import org.inkgate.admin.gui.Fields;
import org.inkgate.admin.gui.Step;

/** Step 5: who on the roster has no response, per form. */
public final class MissingView implements Step {

    private final VBox root;
    private final Node storeField;

    public MissingView(MissingModel model) {
        GridPane grid = Fields.grid();
        storeField = org.inkgate.admin.gui.StoreField.row(grid, 0, "missingStore", "Results store", model.store(),
                model.storePasswordFile(), Fields.Choose.OPEN_FILE);
        Button show = new Button("Show missing responses");
        show.setId("showMissing");
        show.setOnAction(e -> model.show());
        Label report = new Label();
        report.setId("missingReport");
        report.setWrapText(true);
        report.getStyleClass().addAll("step-result", "mono");
        report.textProperty().bind(model.report());
        report.setAccessibleText("Missing-response report");
        root = new VBox(14, Fields.heading("5. Missing responses"),
                Fields.note("Per form: candidates on the roster with no response package, or without a response to one"
                        + " of their form's tasks."), grid, show, report);
        root.getStyleClass().add("step");
    }

    @Override
    public String title() {
        return "5. Missing responses";
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
