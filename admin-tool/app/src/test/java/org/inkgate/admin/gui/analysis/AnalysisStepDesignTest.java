package org.inkgate.admin.gui.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import javafx.scene.Scene;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.TextInputControl;
import javafx.stage.Stage;
import org.inkgate.admin.cli.AnalyseDesignsTest;
import org.inkgate.admin.cli.InkgateAdmin;
import org.inkgate.admin.gui.AdminSession;
import org.inkgate.admin.gui.AdminWindow;
import org.inkgate.admin.testutil.PngSnapshots;
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
 * The analysis step's design choices (issue 20): a declared design and a pre-test column give the
 * window the report {@code analyse --design ... --pre-test ...} writes on the same files. The
 * ratings are SIMULATED, seeded, invented candidates (AnalyseDesignsTest.parallelRatings: 40
 * candidates in two parallel groups); the statistics themselves are checked against R in the
 * analysis module.
 */
@ExtendWith(ApplicationExtension.class)
class AnalysisStepDesignTest {

    private static final int STEP = 8; // the ninth step, after rating administration and exports

    @TempDir
    Path dir;
    private Stage stage;
    private Path ratings;
    private Path candidates;

    @Start
    void start(Stage primary) {
        this.stage = primary;
    }

    @BeforeEach
    void writeInventedParallelStudy() throws Exception {
        ratings = Files.writeString(dir.resolve("ratings.csv"), AnalyseDesignsTest.parallelRatings(5));
        StringBuilder c = new StringBuilder("candidate,level,placement\n");
        for (int i = 0; i < 40; i++) {
            c.append('P').append(i).append(',').append(i % 4 < 2 ? "B1" : "B2").append(',').append(40 + i % 7)
                    .append('\n');
        }
        candidates = Files.writeString(dir.resolve("candidates.csv"), c.toString());
    }

    @Test
    void declaredParallelDesignAndPreTest_inTheWindow_giveTheCommandLinesReport(FxRobot robot) throws Exception {
        Path cliOut = dir.resolve("report-cli");
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = InkgateAdmin.commandLine();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        assertEquals(0, cl.execute("analyse", "--ratings", ratings.toString(), "--candidates", candidates.toString(),
                "--design", "parallel", "--pre-test", "placement", "--out", cliOut.toString()), out + "\n" + err);

        AdminSession session = show(robot);
        Path guiOut = dir.resolve("report-window");
        fill(robot, guiOut);
        robot.interact(() -> {
            chooseDesign(robot, "parallel");
            robot.lookup("#analysisPreTest").queryAs(TextInputControl.class).setText("placement");
        });
        robot.interact(() -> robot.lookup("#analyse").queryButton().fire());
        waitForWork(session);
        assertTrue(label(robot, "#analysisResult").startsWith("Report written to " + guiOut.resolve("report.html")),
                label(robot, "#analysisResult"));

        JsonNode cli = comparable(cliOut.resolve("summary.json"));
        JsonNode gui = comparable(guiOut.resolve("summary.json"));
        assertEquals("parallel", gui.get("comparison.design").asText());
        assertEquals("pre_test", gui.get("comparison.adjusted.adjustment").asText(),
                "the parallel-groups comparison adjusts for the pre-test column, not for level");
        assertEquals(cli, gui, "the window and the command line report the same figures");
        assertTrue(label(robot, "#analysisCommandLine").contains("--design parallel --pre-test placement"),
                label(robot, "#analysisCommandLine"));
        // the result and the same run's command line, below the choices
        robot.interact(() -> robot.lookup(".step-scroll").queryAs(javafx.scene.control.ScrollPane.class).setVvalue(1.0));
        picture(robot, "admin-9-analyse-design.png");
    }

    @Test
    void declaredWithinDesign_onParallelData_isReportedAsAMismatch_likeTheCommand(FxRobot robot) throws Exception {
        AdminSession session = show(robot);
        Path guiOut = dir.resolve("report-mismatch");
        fill(robot, guiOut);
        robot.interact(() -> chooseDesign(robot, "within"));
        robot.interact(() -> robot.lookup("#analyse").queryButton().fire());
        waitForWork(session);
        JsonNode s = new ObjectMapper().readTree(guiOut.resolve("summary.json").toFile());
        assertTrue(s.get("comparison.design_mismatch").asBoolean(), s.toString());
        assertEquals("parallel", s.get("comparison.design_found").asText());
    }

    @Test
    void preTestWithoutCandidatesFile_isRefusedBeforeRunning_andNothingIsWritten(FxRobot robot) throws Exception {
        AdminSession session = show(robot);
        Path guiOut = dir.resolve("report-refused");
        robot.interact(() -> {
            robot.lookup("#analysisRatings").queryAs(TextInputControl.class).setText(ratings.toString());
            robot.lookup("#analysisOut").queryAs(TextInputControl.class).setText(guiOut.toString());
            robot.lookup("#analysisPreTest").queryAs(TextInputControl.class).setText("placement");
            robot.lookup("#analyse").queryButton().fire();
        });
        waitForWork(session);
        assertTrue(label(robot, "#analysisResult").startsWith("Not run: the pre-test is a numeric column of the"
                + " candidates CSV"), label(robot, "#analysisResult"));
        assertFalse(Files.exists(guiOut));
    }

    private AdminSession show(FxRobot robot) {
        AdminSession session = new AdminSession();
        robot.interact(() -> {
            AdminWindow.show(stage, session);
            stage.setWidth(1024);
            stage.setHeight(768);
        });
        robot.interact(() -> robot.lookup("#steps").queryListView().getSelectionModel().select(STEP));
        WaitForAsyncUtils.waitForFxEvents();
        return session;
    }

    private void fill(FxRobot robot, Path out) {
        robot.interact(() -> {
            robot.lookup("#analysisRatings").queryAs(TextInputControl.class).setText(ratings.toString());
            robot.lookup("#analysisCandidates").queryAs(TextInputControl.class).setText(candidates.toString());
            robot.lookup("#analysisOut").queryAs(TextInputControl.class).setText(out.toString());
        });
    }

    @SuppressWarnings("unchecked")
    private static void chooseDesign(FxRobot robot, String word) {
        robot.lookup("#analysisDesign").queryAs(ChoiceBox.class).setValue(word);
    }

    /** The window at 1024x768 as it is. */
    private void picture(FxRobot robot, String name) throws Exception {
        AtomicReference<java.awt.image.BufferedImage> image = new AtomicReference<>();
        Scene scene = stage.getScene();
        WaitForAsyncUtils.waitForFxEvents();
        robot.interact(() -> image.set(PngSnapshots.snapshot(scene)));
        assertEquals(1024, image.get().getWidth());
        assertEquals(768, image.get().getHeight());
        PngSnapshots.save(image.get(), name);
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

    private static String label(FxRobot robot, String query) {
        return robot.lookup(query).queryAs(Label.class).getText();
    }

    private static void waitForWork(AdminSession session) throws Exception {
        WaitForAsyncUtils.waitForFxEvents();
        WaitForAsyncUtils.waitFor(180, TimeUnit.SECONDS, () -> !session.work().busy().get());
        WaitForAsyncUtils.waitForFxEvents();
    }
}
