package org.inkgate.admin.gui.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CancellationException;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import java.util.stream.Stream;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.control.CheckBox;
import javafx.scene.control.Label;
import javafx.scene.control.TextInputControl;
import javafx.scene.web.WebView;
import javafx.stage.Stage;
import org.inkgate.admin.cli.InkgateAdmin;
import org.inkgate.admin.core.rating.RatingDesk.QueueItem;
import org.inkgate.admin.core.rating.RatingDesk.RatingSheet;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.gui.AdminSession;
import org.inkgate.admin.gui.AdminWindow;
import org.inkgate.admin.gui.rating.RatedStore;
import org.inkgate.admin.study.AnalysisRun;
import org.inkgate.admin.testutil.PngSnapshots;
import org.inkgate.analysis.study.StudyOptions;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;
import picocli.CommandLine;

/**
 * The analysis step driven as a test owner drives it, over a store made by the real collect and
 * rated through the real rating store: the window's report equals the command line's on the same
 * store and choices (summary.json, all but the run's date, time and command line), cancelling
 * leaves no report, and the report opens inside the window and in the browser.
 */
@ExtendWith(ApplicationExtension.class)
class AnalysisStepTest {

    private static final List<String> RATERS = List.of("rater-a", "rater-b", "rater-c");
    private static final int STEP = 8; // the ninth step, after rating administration and exports

    @TempDir
    Path dir;
    private Stage stage;
    private RatedStore rated;

    @Start
    void start(Stage primary) {
        this.stage = primary;
    }

    @BeforeEach
    void rateEverything() throws Exception {
        rated = RatedStore.make(dir, RATERS);
        try (RatingStore s = rated.open()) {
            for (String rater : RATERS) {
                for (QueueItem q : s.queue(rater)) {
                    Map<String, Integer> sheet = new HashMap<>();
                    for (ExamSource.Criterion c : rated.exam().rubric().criteria()) {
                        // spread over the scale, fixed by rater, response and criterion (String.hashCode is specified)
                        int span = c.maxScore() - c.minScore() + 1;
                        sheet.put(c.id(), c.minScore() + Math.floorMod((rater + q.blindId() + c.id()).hashCode(), span));
                    }
                    s.submit(rater, q.blindId(), new RatingSheet(sheet, ""));
                }
            }
        }
    }

    @Test
    void window_andCommandLine_onTheSameStore_writeTheSameSummary(FxRobot robot) throws Exception {
        Path cliOut = dir.resolve("report-cli");
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = InkgateAdmin.commandLine();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        assertEquals(0, cl.execute("analyse", "--store", rated.file().toString(), "--out", cliOut.toString(),
                "--mfrm-facets", "task,rater,criterion", "--mfrm-bias", "rater:task"), out + "\n" + err);

        AdminSession session = new AdminSession();
        List<String> opened = new ArrayList<>();
        session.browser(opened::add);
        robot.interact(() -> AdminWindow.show(stage, session));
        robot.interact(() -> session.store().set(rated.file().toString()));
        select(robot);
        Path guiOut = dir.resolve("report-window");
        assertEquals(dir.resolve("report").toAbsolutePath().toString(), text(robot, "#analysisOut"),
                "the report folder is suggested beside the store");
        setText(robot, "#analysisOut", guiOut.toString());
        robot.interact(() -> {
            robot.lookup("#analysisRasch").queryAs(CheckBox.class).setSelected(true);
            for (String f : List.of("task", "rater", "criterion")) {
                robot.lookup("#facet-" + f).queryAs(CheckBox.class).setSelected(true);
            }
        });
        setText(robot, "#analysisBias", "rater:task");
        robot.interact(() -> robot.lookup("#analyse").queryButton().fire());
        waitForWork(session);
        String result = label(robot, "#analysisResult");
        assertTrue(result.startsWith("Report written to " + guiOut.resolve("report.html")), result);

        JsonNode cli = comparable(cliOut.resolve("summary.json"));
        JsonNode gui = comparable(guiOut.resolve("summary.json"));
        assertTrue(cli.size() > 50, "a real summary to compare: " + cli.size() + " figures");
        assertTrue(cli.has("mfrm.available") || cli.toString().contains("mfrm"), "the Rasch section is in it");
        assertEquals(cli, gui, "the window and the command line report the same figures");
        // the window records the command line that gives its report
        JsonNode provenance = new ObjectMapper().readTree(guiOut.resolve("summary.json").toFile());
        String command = label(robot, "#analysisCommandLine");
        assertTrue(command.endsWith(commandLineOf(provenance)), command + " vs " + commandLineOf(provenance));

        robot.interact(() -> robot.lookup("#openReport").queryButton().fire());
        assertEquals(List.of(guiOut.resolve("report.html").toUri().toString()), opened);
        robot.interact(() -> robot.lookup("#showReport").queryButton().fire());
        WebView web = robot.lookup("#reportView").queryAs(WebView.class);
        WaitForAsyncUtils.waitFor(60, TimeUnit.SECONDS, () -> WaitForAsyncUtils.asyncFx(() -> web.getEngine()
                .getLoadWorker().getState() == javafx.concurrent.Worker.State.SUCCEEDED).get());
        AtomicReference<Object> heading = new AtomicReference<>();
        robot.interact(() -> heading.set(web.getEngine().executeScript("document.title")));
        assertEquals("Analysis of ratings", heading.get(), "the report renders inside the window");
    }

    @Test
    void anchorFile_fromAnEarlierRun_givesTheWindowTheCommandLinesAnchoredReport(FxRobot robot) throws Exception {
        Path earlier = dir.resolve("earlier");
        Path cliOut = dir.resolve("anchored-cli");
        cli("analyse", "--store", rated.file().toString(), "--out", earlier.toString(), "--mfrm-facets",
                "task,rater,criterion");
        Path anchors = earlier.resolve("mfrm_anchors.csv");
        assertTrue(Files.isRegularFile(anchors), "the earlier run wrote its anchor file");
        cli("analyse", "--store", rated.file().toString(), "--out", cliOut.toString(), "--mfrm-facets",
                "task,rater,criterion", "--mfrm-anchors", anchors.toString());

        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));
        robot.interact(() -> session.store().set(rated.file().toString()));
        select(robot);
        Path guiOut = dir.resolve("anchored-window");
        setText(robot, "#analysisOut", guiOut.toString());
        robot.interact(() -> {
            robot.lookup("#analysisRasch").queryAs(CheckBox.class).setSelected(true);
            for (String f : List.of("task", "rater", "criterion")) {
                robot.lookup("#facet-" + f).queryAs(CheckBox.class).setSelected(true);
            }
        });
        setText(robot, "#analysisAnchors", anchors.toString());
        robot.interact(() -> robot.lookup("#analyse").queryButton().fire());
        waitForWork(session);
        assertTrue(label(robot, "#analysisResult").startsWith("Report written"), label(robot, "#analysisResult"));
        JsonNode cli = comparable(cliOut.resolve("summary.json"));
        assertTrue(cli.toString().contains(anchors.toString()), "the anchor file is among the run's inputs");
        assertEquals(cli, comparable(guiOut.resolve("summary.json")), "the same anchored report");
    }

    private static void cli(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = InkgateAdmin.commandLine();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        assertEquals(0, cl.execute(args), out + "\n" + err);
    }

    @Test
    void aStoreThatIsNotThere_isRefusedInPlainWords_andNothingIsWritten(FxRobot robot) throws Exception {
        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));
        select(robot);
        Path missing = dir.resolve("no-such-store.db");
        setText(robot, "#analysisStore", missing.toString());
        Path out = dir.resolve("report-refused");
        setText(robot, "#analysisOut", out.toString());
        robot.interact(() -> robot.lookup("#analyse").queryButton().fire());
        waitForWork(session);
        String result = label(robot, "#analysisResult");
        assertTrue(result.startsWith("No report was written.\nno results store at " + missing), result);
        assertFalse(result.contains("Unexpected problem"), result);
        assertFalse(Files.exists(out));
    }

    @Test
    void cancel_afterTheReportIsWrittenAside_leavesNoReportAndNoPartialFolder() throws Exception {
        Path out = dir.resolve("report-cancelled");
        List<String> stages = new ArrayList<>();
        AnalysisRun.Request request = new AnalysisRun.Request(null, null, List.of(), List.of(), null, null, null,
                rated.file(), null, out, StudyOptions.DEFAULT, null, null, List.of("--store", rated.file().toString()));
        assertThrows(CancellationException.class, () -> AnalysisRun.run(request, new AnalysisRun.Listener() {
            @Override
            public void stage(int done, int total, String what) {
                stages.add(what);
            }

            @Override
            public void warn(String text) {
            }

            @Override
            public boolean cancelled() {
                // cancelled once every file is written into the hidden folder, before it moves into place
                return stages.stream().anyMatch(s -> s.startsWith("Moving"));
            }
        }));
        assertFalse(Files.exists(out), "no report folder");
        try (Stream<Path> left = Files.list(dir)) {
            assertEquals(List.of(), left.filter(p -> p.getFileName().toString().contains(".partial")).toList(),
                    "no half-written folder left behind");
        }
    }

    @Test
    void cancel_inTheWindow_saysSoAndWritesNothing(FxRobot robot) throws Exception {
        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));
        robot.interact(() -> session.store().set(rated.file().toString()));
        select(robot);
        Path out = dir.resolve("report-window-cancelled");
        setText(robot, "#analysisOut", out.toString());
        robot.interact(() -> {
            robot.lookup("#analysisRasch").queryAs(CheckBox.class).setSelected(true);
            robot.lookup("#facet-rater").queryAs(CheckBox.class).setSelected(true);
            robot.lookup("#analyse").queryButton().fire();
            // pressed while the run is still reading its inputs
            robot.lookup("#cancelAnalysis").queryButton().fire();
        });
        waitForWork(session);
        assertTrue(label(robot, "#analysisResult").startsWith("Cancelled. No report was written"),
                label(robot, "#analysisResult"));
        // the background thread stops at its next check; a job queued after it runs once it has
        CountDownWait.drain(session);
        assertFalse(Files.exists(out), "no report folder");
    }

    /**
     * Issue 15 §2: Cancel pressed in the window once the report is moving into place (after the
     * commit point) is refused; the step says so and then reports the complete report, never "Cancelled".
     */
    @Test
    void cancel_inTheWindow_onceTheReportIsMoving_isRefusedAndTheReportIsWhole(FxRobot robot) throws Exception {
        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));
        robot.interact(() -> session.store().set(rated.file().toString()));
        select(robot);
        Path out = dir.resolve("report-window-late-cancel");
        setText(robot, "#analysisOut", out.toString());
        AnalysisModel model = (AnalysisModel) robot.lookup("#analyse").queryButton().getProperties()
                .get(AnalysisModel.class);
        List<String> toldWhileMoving = new ArrayList<>();
        model.watch = new AnalysisRun.Listener() {
            @Override
            public void stage(int done, int total, String what) {
            }

            @Override
            public void warn(String text) {
            }

            @Override
            public void publishing() {
                robot.interact(() -> {
                    robot.lookup("#cancelAnalysis").queryButton().fire();
                    toldWhileMoving.add(label(robot, "#analysisResult"));
                });
            }
        };
        robot.interact(() -> robot.lookup("#analyse").queryButton().fire());
        waitForWork(session);
        assertEquals(1, toldWhileMoving.size());
        assertTrue(toldWhileMoving.get(0).startsWith("Too late to cancel"), toldWhileMoving.get(0));
        String shown = label(robot, "#analysisResult");
        assertTrue(shown.startsWith("Cancel came too late"), shown);
        assertFalse(shown.contains("Cancelled."), shown);
        assertTrue(Files.isRegularFile(out.resolve("report.html")));
        assertTrue(Files.isRegularFile(out.resolve("summary.json")));
        try (Stream<Path> left = Files.list(dir)) {
            assertEquals(List.of(), left.filter(p -> p.getFileName().toString().contains(".partial")).toList());
        }
    }

    @Test
    void everyNewControl_hasAnAccessibleName_andTheStepIsPictured(FxRobot robot) throws Exception {
        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));
        robot.interact(() -> {
            stage.setWidth(1024);
            stage.setHeight(768);
            session.store().set(rated.file().toString());
        });
        select(robot);
        Node view = robot.lookup("#analysisStore").query().getParent();
        while (!view.getStyleClass().contains("step")) {
            view = view.getParent();
        }
        int checked = 0;
        for (Node n : robot.from(view).lookup((java.util.function.Predicate<Node>) n -> n instanceof javafx.scene.control.Control
                && !(n instanceof Label) && !(n instanceof javafx.scene.control.ScrollBar)).queryAll()) {
            assertTrue(n.getAccessibleText() != null && !n.getAccessibleText().isBlank(), n + " has no accessible name");
            checked++;
        }
        assertTrue(checked >= 20, "controls checked: " + checked);
        robot.interact(() -> {
            robot.lookup("#analysisRasch").queryAs(CheckBox.class).setSelected(true);
            robot.lookup("#facet-rater").queryAs(CheckBox.class).setSelected(true);
            robot.lookup("#facet-task").queryAs(CheckBox.class).setSelected(true);
        });
        setText(robot, "#analysisBias", "rater:task");
        robot.interact(() -> robot.lookup("#analyse").queryButton().fire());
        waitForWork(session);
        // the picture shows the result, the same run's command line and the report inside the window
        robot.interact(() -> robot.lookup("#showReport").queryButton().fire());
        WebView web = robot.lookup("#reportView").queryAs(WebView.class);
        WaitForAsyncUtils.waitFor(60, TimeUnit.SECONDS, () -> WaitForAsyncUtils.asyncFx(() -> web.getEngine()
                .getLoadWorker().getState() == javafx.concurrent.Worker.State.SUCCEEDED).get());
        robot.interact(() -> robot.lookup(".step-scroll").queryAs(javafx.scene.control.ScrollPane.class).setVvalue(0.5));
        AtomicReference<java.awt.image.BufferedImage> image = new AtomicReference<>();
        Scene scene = stage.getScene();
        WaitForAsyncUtils.waitForFxEvents();
        robot.interact(() -> image.set(PngSnapshots.snapshot(scene)));
        assertEquals(1024, image.get().getWidth());
        assertEquals(768, image.get().getHeight());
        PngSnapshots.save(image.get(), "admin-9-analyse.png");
    }

    /** Waits until the work thread has finished whatever it was still doing. */
    private static final class CountDownWait {
        static void drain(AdminSession session) throws Exception {
            java.util.concurrent.CountDownLatch done = new java.util.concurrent.CountDownLatch(1);
            javafx.application.Platform.runLater(() -> session.work().run("Waiting", p -> null, x -> done.countDown(),
                    x -> done.countDown()));
            assertTrue(done.await(120, TimeUnit.SECONDS), "the work thread finished");
        }
    }

    /** summary.json without what differs between two runs by design: the date, time and command line. */
    private static JsonNode comparable(Path summary) throws Exception {
        ObjectNode s = (ObjectNode) new ObjectMapper().readTree(summary.toFile());
        List<String> differ = new ArrayList<>();
        s.fieldNames().forEachRemaining(k -> {
            if (k.startsWith("provenance.") && (k.endsWith("date_time_utc") || k.endsWith("command_line")
                    || k.endsWith("arguments"))) {
                differ.add(k);
            }
        });
        assertEquals(3, differ.size(), "the provenance's date, command line and arguments: " + differ);
        s.remove(differ);
        return s;
    }

    private static String commandLineOf(JsonNode summary) {
        JsonNode c = summary.get("provenance.command_line");
        assertNotNull(c, "provenance.command_line in summary.json");
        return c.asText();
    }

    private static void select(FxRobot robot) {
        robot.interact(() -> robot.lookup("#steps").queryListView().getSelectionModel().select(STEP));
        WaitForAsyncUtils.waitForFxEvents();
    }

    private static void setText(FxRobot robot, String query, String text) {
        robot.interact(() -> robot.lookup(query).queryAs(TextInputControl.class).setText(text));
    }

    private static String text(FxRobot robot, String query) {
        return robot.lookup(query).queryAs(TextInputControl.class).getText();
    }

    private static String label(FxRobot robot, String query) {
        return robot.lookup(query).queryAs(Label.class).getText();
    }

    private static void waitForWork(AdminSession session) throws Exception {
        WaitForAsyncUtils.waitForFxEvents();
        WaitForAsyncUtils.waitFor(180, TimeUnit.SECONDS, () -> !session.work().busy().get());
        WaitForAsyncUtils.waitForFxEvents();
    }
}
