package org.inkgate.admin.gui.rating;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.sql.DriverManager;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import javafx.scene.control.Label;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.inkgate.admin.cli.InkgateAdmin;
import org.inkgate.admin.core.rating.ControlMonitor;
import org.inkgate.admin.core.rating.ControlScripts;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.gui.StepDriver;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;
import picocli.CommandLine;

/**
 * Issue 15's check "a rater scores through the desk, meets a control script and is flagged after a
 * planted drift": rater-a works through the whole queue in the desk by keyboard; the control items
 * look like every other item on screen; the later half of them is scored 3 points above the agreed
 * scores, and {@code rate monitor} flags rater-a for drift.
 */
@ExtendWith(ApplicationExtension.class)
class DeskControlScriptTest {

    private static final List<String> RATERS = List.of("rater-a", "rater-b", "rater-c", "rater-d");

    @TempDir
    Path dir;
    private Stage stage;
    private final List<AutoCloseable> open = new ArrayList<>();

    @Start
    void start(Stage primary) {
        this.stage = primary;
    }

    @AfterEach
    void closeAll(FxRobot robot) throws Exception {
        robot.interact(() -> stage.hide());
        for (AutoCloseable c : open.reversed()) {
            c.close();
        }
    }

    @Test
    void rater_meetsUnannouncedControls_inTheDesk_andIsFlaggedAfterAPlantedDrift(FxRobot robot) throws Exception {
        RatedStore rated = RatedStore.make(dir, RATERS);
        try (RatingStore s = rated.open()) {
            ControlScripts controls = s;
            for (int i = 1; i <= 8; i++) {
                controls.markControl(String.format("H10%02d", i), "ferry-complaint",
                        Map.of("task-fulfilment", 6, "language-control", 5), "invented standardisation meeting");
            }
            controls.mixControls(11);
        }
        Set<String> controlIds = controlIds(rated.file(), "rater-a");
        assertTrue(controlIds.size() >= 2, "rater-a meets at least two control scripts: " + controlIds);

        RatingStore store = rated.open();
        open.add(store);
        DeskModel desk = new DeskModel(store);
        open.add(desk);
        robot.interact(() -> DeskWindow.show(stage, desk));
        DeskShots.settle(desk);
        robot.type(KeyCode.ENTER);
        DeskShots.settle(desk);
        assertEquals("rater-a", desk.rater().get().id());
        int total = desk.queue().size();
        int controlsSeen = 0;
        for (int i = 0; i < total; i++) {
            String id = desk.current().get().blindId();
            String heading = robot.lookup("#itemHeading").queryAs(Label.class).getText();
            assertEquals("Response " + id, heading);
            assertFalse(robot.lookup("#itemKind").query().isVisible(), "no label sets a control apart");
            boolean control = controlIds.contains(id);
            // real items 5/5; controls at the agreed 6/5, the later half 3 points higher (the planted drift)
            String[] scores = !control ? new String[] {"5", "5"}
                    : controlsSeen++ < controlIds.size() - controlIds.size() / 2 ? new String[] {"6", "5"}
                    : new String[] {"9", "8"};
            robot.write(scores[0]).type(KeyCode.ENTER).write(scores[1]);
            robot.press(KeyCode.CONTROL).type(KeyCode.ENTER).release(KeyCode.CONTROL);
            DeskShots.settle(desk);
        }
        assertTrue(desk.finished().get(), "the whole queue rated");
        assertEquals(controlIds.size(), controlsSeen);

        StringWriter out = new StringWriter();
        CommandLine cli = InkgateAdmin.commandLine();
        cli.setOut(new PrintWriter(out, true));
        cli.setErr(new PrintWriter(new StringWriter(), true));
        int code = cli.execute("rate", "monitor", "--store", rated.file().toString());
        assertEquals(InkgateAdmin.ATTENTION, code, out.toString());
        String line = out.toString().lines().filter(l -> l.strip().startsWith("rater-a")).findFirst().orElseThrow();
        assertTrue(line.contains("FLAGGED") && line.contains("drift +3.00 beyond +-1.00"), line);

        // the test owner sees the same flag in the window's rating step, on the row of rater-a
        org.inkgate.admin.gui.AdminSession session = new org.inkgate.admin.gui.AdminSession();
        robot.interact(() -> org.inkgate.admin.gui.AdminWindow.show(stage, session));
        StepDriver.select(robot, "Rating administration");
        StepDriver.setText(robot, "#ratingStore", rated.file().toString());
        StepDriver.press(robot, "#refreshRating");
        StepDriver.waitForWork(session);
        WaitForAsyncUtils.waitForFxEvents();
        @SuppressWarnings("unchecked")
        List<ControlMonitor.RaterReport> monitor = List.copyOf(robot.lookup("#raterMonitor")
                .queryAs(javafx.scene.control.TableView.class).getItems());
        ControlMonitor.RaterReport a = monitor.stream().filter(r -> r.raterId().equals("rater-a")).findFirst()
                .orElseThrow();
        assertTrue(a.flags().contains("drift +3.00 beyond +-1.00"), a.flags().toString());
        assertTrue(line.contains("FLAGGED: " + String.join("; ", a.flags())), line);
        StepDriver.press(robot, "#applyMonitorLimits");
        robot.interact(() -> {
            stage.setWidth(1024);
            stage.setHeight(768);
        });
        StepDriver.scrollTo(robot, "#raterMonitor", 330);
        StepDriver.shoot1024(robot, stage, "admin-rating-monitor.png");
    }

    private static Set<String> controlIds(Path store, String rater) throws Exception {
        Set<String> ids = new HashSet<>();
        try (var c = DriverManager.getConnection("jdbc:sqlite:" + store); var ps = c.prepareStatement(
                "SELECT a.blind_id FROM control_assignments ca JOIN rating_assignments a"
                        + " ON a.assignment_id = ca.assignment_id WHERE a.rater_id = ?")) {
            ps.setString(1, rater);
            try (var rs = ps.executeQuery()) {
                while (rs.next()) {
                    ids.add(rs.getString(1));
                }
            }
        }
        return ids;
    }
}
