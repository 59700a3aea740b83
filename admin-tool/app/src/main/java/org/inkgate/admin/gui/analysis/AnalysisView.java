package org.inkgate.admin.gui.analysis;

import java.util.Map;
import javafx.beans.binding.Bindings;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;
import javafx.scene.web.WebView;
import javafx.util.StringConverter;
import org.inkgate.admin.gui.Fields;
import org.inkgate.admin.gui.Step;
import org.inkgate.admin.gui.Work;
import org.inkgate.admin.study.RaschChoices;
import org.inkgate.analysis.mfrm.StudyRatings;
import org.inkgate.analysis.scores.ScoreRule;

/**
 * Step 7: choose the inputs and options of the analysis, run it with progress and cancel, and read
 * the report here (a WebView of the self-contained report.html) or in the system browser.
 */
public final class AnalysisView implements Step {

    static final String TITLE = "9. Analyse";

    private final VBox root;
    private final TextField store;
    private final VBox reportBox = new VBox(8);

    public AnalysisView(AnalysisModel model, Work work) {
        GridPane inputs = Fields.grid();
        store = org.inkgate.admin.gui.StoreField.row(inputs, 0, "analysisStore", "Results store", model.store(),
                model.storePasswordFile(), Fields.Choose.OPEN_FILE);
        TextField exam = new TextField();
        exam.setId("analysisExam");
        exam.setAccessibleText("Exam id in the store (blank when the store holds one exam)");
        exam.setPromptText("blank when the store holds one exam");
        exam.setMaxWidth(360);
        exam.textProperty().bindBidirectional(model.exam());
        Fields.row(inputs, 1, "Exam id", exam);
        Fields.pathRow(inputs, 2, "analysisRatings", "Ratings CSV (optional)", model.ratings(),
                Fields.Choose.OPEN_FILE);
        Fields.pathRow(inputs, 3, "analysisCandidates", "Candidates CSV", model.candidates(), Fields.Choose.OPEN_FILE);
        Fields.pathRow(inputs, 4, "analysisOut", "Report folder", model.out(), Fields.Choose.FOLDER);
        TextField title = new TextField();
        title.setId("analysisTitle");
        title.setAccessibleText("Report title");
        title.setMaxWidth(480);
        title.textProperty().bindBidirectional(model.title());
        Fields.row(inputs, 5, "Report title", title);
        ChoiceBox<ScoreRule> rule = new ChoiceBox<>(javafx.collections.FXCollections.observableArrayList(ScoreRule.values()));
        rule.setId("analysisScoreRule");
        rule.setAccessibleText("How criteria combine into a response score");
        rule.setConverter(converter(r -> r == ScoreRule.MEAN ? "Mean of the criteria" : "Sum of the criteria"));
        rule.valueProperty().bindBidirectional(model.scoreRule());
        Fields.row(inputs, 6, "Response score", rule);
        ChoiceBox<String> design = new ChoiceBox<>(javafx.collections.FXCollections.observableArrayList(
                AnalysisModel.DESIGNS));
        design.setId("analysisDesign");
        design.setAccessibleText("The study design the analysis checks the data against");
        design.setConverter(converter(d -> switch (d) {
            case AnalysisModel.FROM_THE_DATA -> "Read from the data";
            case "within" -> "Within candidates: every candidate under every condition";
            case "parallel" -> "Parallel groups: each candidate under one condition";
            default -> d;
        }));
        design.valueProperty().bindBidirectional(model.design());
        Fields.row(inputs, 7, "Study design", design);
        TextField preTest = new TextField();
        preTest.setId("analysisPreTest");
        preTest.setAccessibleText("Pre-test column of the candidates CSV that the parallel-groups comparison adjusts"
                + " for; blank to adjust for level");
        preTest.setPromptText("e.g. placement; blank adjusts for level");
        preTest.setMaxWidth(360);
        preTest.textProperty().bindBidirectional(model.preTest());
        Fields.row(inputs, 8, "Pre-test column", preTest);
        // labels keep their full width; the fields take what is left
        inputs.getColumnConstraints().setAll(new javafx.scene.layout.ColumnConstraints(
                javafx.scene.layout.Region.USE_PREF_SIZE, javafx.scene.layout.Region.USE_COMPUTED_SIZE,
                javafx.scene.layout.Region.USE_PREF_SIZE), new javafx.scene.layout.ColumnConstraints());

        CheckBox rasch = new CheckBox("Many-facet Rasch measurement");
        rasch.setId("analysisRasch");
        rasch.setAccessibleText("Run many-facet Rasch measurement");
        rasch.selectedProperty().bindBidirectional(model.rasch());
        int r = 10; // the many-facet Rasch rows, under the switch in row 9
        FlowPane facets = new FlowPane(16, 6);
        facets.setAccessibleText("Facets besides the candidates");
        for (Map.Entry<String, javafx.beans.property.BooleanProperty> f : model.facets().entrySet()) {
            CheckBox box = new CheckBox(f.getKey());
            box.setId("facet-" + f.getKey());
            box.setAccessibleText("Facet " + f.getKey());
            box.selectedProperty().bindBidirectional(f.getValue());
            facets.getChildren().add(box);
        }
        inputs.add(rasch, 1, 9);
        Fields.row(inputs, r, "Facets besides candidates", facets);
        facets.disableProperty().bind(model.rasch().not());
        ChoiceBox<String> structure = new ChoiceBox<>();
        structure.setId("analysisStructure");
        structure.setAccessibleText("Rating scale structure");
        structure.getItems().add(RaschChoices.RATING_SCALE);
        StudyRatings.COLUMNS.forEach(c -> structure.getItems().add(RaschChoices.PARTIAL_CREDIT + c));
        structure.setConverter(converter(s -> s.equals(RaschChoices.RATING_SCALE) ? "One rating scale for all"
                : "Partial credit: own thresholds per " + s.substring(RaschChoices.PARTIAL_CREDIT.length())));
        structure.valueProperty().bindBidirectional(model.structure());
        Fields.row(inputs, r + 1, "Structure", structure);
        structure.disableProperty().bind(model.rasch().not());
        TextField bias = new TextField();
        bias.setId("analysisBias");
        bias.setAccessibleText("Bias pairs, for example rater:task, condition:level");
        bias.setPromptText("e.g. rater:task, condition:level");
        bias.setMaxWidth(480);
        bias.textProperty().bindBidirectional(model.biasPairs());
        Fields.row(inputs, r + 2, "Bias pairs", bias);
        bias.disableProperty().bind(model.rasch().not());
        ChoiceBox<String> estimation = new ChoiceBox<>(javafx.collections.FXCollections.observableArrayList("fixed",
                "joint"));
        estimation.setId("analysisBiasEstimation");
        estimation.setAccessibleText("How bias sizes are estimated");
        estimation.setConverter(converter(s -> s.equals("fixed") ? "Main effects held fixed (fast)"
                : "Jointly with the main effects (one refit per combination)"));
        estimation.valueProperty().bindBidirectional(model.biasEstimation());
        Fields.row(inputs, r + 3, "Bias estimation", estimation);
        estimation.disableProperty().bind(model.rasch().not());
        TextField anchorFile = Fields.pathRow(inputs, r + 4, "analysisAnchors", "Anchor file", model.anchors(),
                Fields.Choose.OPEN_FILE);
        anchorFile.getParent().disableProperty().bind(model.rasch().not());

        Button run = new Button("Analyse");
        run.setId("analyse");
        run.setAccessibleText("Run the analysis");
        run.disableProperty().bind(work.busy());
        run.setOnAction(e -> model.analyse());
        run.getProperties().put(AnalysisModel.class, model); // lets a test press Cancel at the commit point
        Button cancel = new Button("Cancel");
        cancel.setId("cancelAnalysis");
        cancel.setAccessibleText("Cancel the running analysis; nothing is written unless the report is already moving into place");
        cancel.disableProperty().bind(model.running().not());
        cancel.setOnAction(e -> model.cancel());
        Label result = new Label();
        result.setId("analysisResult");
        result.setWrapText(true);
        result.getStyleClass().add("step-result");
        result.textProperty().bind(model.result());
        result.visibleProperty().bind(model.result().isNotEmpty());
        result.managedProperty().bind(result.visibleProperty());
        Label warnings = new Label();
        warnings.setId("analysisWarnings");
        warnings.setWrapText(true);
        warnings.getStyleClass().add("warning-box");
        warnings.textProperty().bind(model.warnings());
        warnings.visibleProperty().bind(model.warnings().isNotEmpty());
        warnings.managedProperty().bind(warnings.visibleProperty());
        Label command = new Label();
        command.setId("analysisCommandLine");
        command.setWrapText(true);
        command.getStyleClass().addAll("step-note", "mono");
        command.textProperty().bind(Bindings.createStringBinding(() -> model.commandLine().get().isEmpty() ? ""
                : "The same run on the command line: " + model.commandLine().get(), model.commandLine()));

        Button show = new Button("Show the report here");
        show.setId("showReport");
        show.setAccessibleText("Show the report inside the window");
        show.disableProperty().bind(model.report().isNull());
        show.setOnAction(e -> showReport(model));
        Button browser = new Button("Open in the browser");
        browser.setId("openReport");
        browser.setAccessibleText("Open the report in the system browser");
        browser.disableProperty().bind(model.report().isNull());
        browser.setOnAction(e -> {
            if (!model.openInBrowser()) {
                model.result().set(model.result().get() + "\nNo system browser is available here; open "
                        + model.report().get() + " yourself.");
            }
        });
        model.report().addListener((o, was, now) -> reportBox.getChildren().clear());

        root = new VBox(14, Fields.heading(TITLE),
                Fields.note("Analyses the ratings as inkgate-admin analyse does, with the same report: descriptive"
                        + " statistics, the with/without-resources comparison, rater agreement and the other sections;"
                        + " with many-facet Rasch measurement also measures, fit and bias. The report reads the study"
                        + " design from the data; a declared design is checked against them, and a mismatch is reported,"
                        + " not analysed. Read the report's notes on"
                        + " each statistic's assumptions before relying on it; decisions about candidates follow your"
                        + " regulations."),
                inputs, new HBox(12, run, cancel), result, warnings, command,
                new HBox(12, show, browser), reportBox);
        root.getStyleClass().add("step");
    }

    /** The WebView is made on first use: it loads the browser engine, which the other steps never need. */
    private void showReport(AnalysisModel model) {
        WebView web = new WebView();
        web.setId("reportView");
        web.setAccessibleText("The analysis report");
        web.setPrefHeight(560);
        web.getEngine().load(model.report().get().toUri().toString());
        reportBox.getChildren().setAll(web);
    }

    private static <T> StringConverter<T> converter(java.util.function.Function<T, String> text) {
        return new StringConverter<>() {
            @Override
            public String toString(T value) {
                return value == null ? "" : text.apply(value);
            }

            @Override
            public T fromString(String s) {
                throw new UnsupportedOperationException("choices are not typed");
            }
        };
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
        return store;
    }
}
