package org.inkgate.admin.gui.ratingadmin;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javafx.scene.control.TableView;
import javafx.stage.Stage;
import org.inkgate.admin.core.rating.QualificationStanding;
import org.inkgate.admin.core.rating.RatingDesk;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.gui.AdminSession;
import org.inkgate.admin.gui.AdminWindow;
import org.inkgate.admin.gui.StepDriver;
import org.inkgate.admin.gui.rating.RatedStore;
import org.inkgate.admin.testutil.CommandLineSitting;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * Issue 15 §3 in the window: the test owner marks a qualification script, gives the set, sets the
 * rule, sees a rater outside the limits and admits them, in the rating-administration step, over a
 * store made by the real collect; {@code rate qualification status} says the same of the same store.
 */
@ExtendWith(ApplicationExtension.class)
class QualificationStepTest {

    private static final List<String> RATERS = List.of("rater-a", "rater-b");

    @TempDir
    Path dir;
    private Stage stage;

    @Start
    void start(Stage primary) {
        this.stage = primary;
    }

    @Test
    void markGiveRuleAndAdmit_inTheWindow_matchTheCommandLine(FxRobot robot) throws Exception {
        RatedStore store = RatedStore.make(dir, RATERS);
        String db = store.file().toString();
        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));
        StepDriver.select(robot, "Rating administration");
        StepDriver.setText(robot, "#ratingStore", db);
        StepDriver.setText(robot, "#qualificationCandidate", "H1001");
        StepDriver.setText(robot, "#qualificationTask", "ferry-complaint");
        StepDriver.setText(robot, "#qualificationAgreed", "task-fulfilment=6, language-control=5");
        StepDriver.setText(robot, "#qualificationSource", "invented standardisation meeting");
        StepDriver.press(robot, "#markQualification");
        StepDriver.waitForWork(session);
        StepDriver.press(robot, "#giveQualification");
        StepDriver.waitForWork(session);
        assertTrue(StepDriver.label(robot, "#ratingMessage").startsWith("2 qualification item(s) given"),
                StepDriver.label(robot, "#ratingMessage"));
        StepDriver.setText(robot, "#qualificationMinAdjacent", "2");
        StepDriver.press(robot, "#setQualificationRule");
        StepDriver.waitForWork(session);
        assertTrue(StepDriver.label(robot, "#ratingMessage").contains("share between 0 and 1"),
                StepDriver.label(robot, "#ratingMessage"));
        StepDriver.setText(robot, "#qualificationMinAdjacent", "1");
        StepDriver.press(robot, "#setQualificationRule");
        StepDriver.waitForWork(session);
        assertEquals("Qualification rule: adjacent agreement at least 1.00.", StepDriver.label(robot, "#qualificationRule"));

        try (RatingStore s = store.open()) {
            RatingDesk.QueueItem q = s.queue("rater-a").get(0);
            assertEquals(RatingDesk.Kind.QUALIFICATION, q.kind());
            s.submit("rater-a", q.blindId(), new RatingDesk.RatingSheet(java.util.Map.of("task-fulfilment", 9,
                    "language-control", 9), ""));
        }
        StepDriver.press(robot, "#refreshRating");
        StepDriver.waitForWork(session);
        List<QualificationStanding> shown = rows(robot, "#qualificationStandings");
        assertEquals(QualificationStanding.Status.NOT_PASSED, shown.get(0).status());
        assertEquals(QualificationStanding.Status.IN_PROGRESS, shown.get(1).status());
        java.io.StringWriter out = new java.io.StringWriter();
        picocli.CommandLine cli = org.inkgate.admin.cli.InkgateAdmin.commandLine();
        cli.setOut(new java.io.PrintWriter(out, true));
        assertEquals(org.inkgate.admin.cli.InkgateAdmin.ATTENTION, cli.execute("rate", "qualification", "status",
                "--store", db), out.toString());
        assertTrue(out.toString().contains("not passed: live rating closed"), out.toString());

        StepDriver.setText(robot, "#admitRaterId", "rater-a");
        StepDriver.setText(robot, "#admitBy", "Invented test owner");
        StepDriver.setText(robot, "#admitReason", "rubric discussed");
        StepDriver.press(robot, "#admitRater");
        StepDriver.waitForWork(session);
        List<QualificationStanding> admitted = rows(robot, "#qualificationStandings");
        assertEquals(QualificationStanding.Status.ADMITTED, admitted.get(0).status());
        assertTrue(CommandLineSitting.admin("rate", "qualification", "status", "--store", db)
                .contains("admitted by the test owner: live rating open by Invented test owner: rubric discussed"));
        robot.interact(() -> {
            stage.setWidth(1024);
            stage.setHeight(768);
        });
        StepDriver.scrollTo(robot, "#qualificationStandings", 300);
        StepDriver.shoot1024(robot, stage, "admin-rating-qualification.png");
    }

    @SuppressWarnings("unchecked")
    private static <T> List<T> rows(FxRobot robot, String query) {
        org.testfx.util.WaitForAsyncUtils.waitForFxEvents();
        TableView<T> table = robot.lookup(query).queryAs(TableView.class);
        return new ArrayList<>(table.getItems());
    }
}
