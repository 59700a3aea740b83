package org.inkgate.admin.gui.rating;

import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.VBox;
import org.inkgate.admin.gui.Fields;
import org.inkgate.admin.gui.Step;
import org.inkgate.admin.gui.Work;

/** Step 6 of the admin window: open the rating desk over a results store. */
public final class DeskStep implements Step {

    static final String TITLE = "6. Rating desk";

    private final VBox root;
    private final Node storeField;

    public DeskStep(DeskStepModel model, Work work) {
        GridPane grid = Fields.grid();
        storeField = org.inkgate.admin.gui.StoreField.row(grid, 0, "deskStore", "Results store", model.store(),
                model.storePasswordFile(), Fields.Choose.OPEN_FILE);
        TextField exam = new TextField();
        exam.setId("deskExam");
        exam.setAccessibleText("Exam id (may stay empty when the store holds one exam)");
        exam.setPromptText("only needed when the store holds several exams");
        exam.textProperty().bindBidirectional(model.exam());
        Fields.row(grid, 1, "Exam id", exam);
        Button open = new Button("Open the rating desk");
        open.setId("openDesk");
        open.setOnAction(e -> model.open());
        open.disableProperty().bind(work.busy());
        Label result = new Label();
        result.setId("deskResult");
        result.setWrapText(true);
        result.getStyleClass().add("step-result");
        result.textProperty().bind(model.result());
        result.visibleProperty().bind(model.result().isNotEmpty());
        root = new VBox(14, Fields.heading(TITLE),
                Fields.note("Opens the desk where raters score their queues, blind: they see a response id, the text and"
                        + " the rubric, never who wrote it or under which condition. Add raters and assign the responses"
                        + " first (inkgate-admin rate raters add, rate assign). The desk asks for no password: a rater"
                        + " chooses their own id, so decide who may use this machine by your own rules."),
                grid, open, result);
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
