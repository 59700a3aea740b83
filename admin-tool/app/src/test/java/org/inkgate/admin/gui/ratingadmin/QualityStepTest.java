package org.inkgate.admin.gui.ratingadmin;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.sql.DriverManager;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import javafx.scene.control.TableRow;
import javafx.scene.control.TableView;
import javafx.stage.Stage;
import org.inkgate.admin.cli.InkgateAdmin;
import org.inkgate.admin.core.rating.ControlMonitor;
import org.inkgate.admin.core.rating.ControlScripts;
import org.inkgate.admin.core.rating.RatingDesk.RatingSheet;
import org.inkgate.admin.core.rating.Referrals;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;
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
import org.testfx.util.WaitForAsyncUtils;
import picocli.CommandLine;

/**
 * Issue 15 §3 in the window: the test owner marks control scripts and mixes them in, sees each
 * rater against the agreed scores (a planted drift flags one), and lists and decides a
 * referral, all in the rating-administration step; {@code rate control}, {@code rate monitor}
 * and {@code rate referrals} see and say the same on the same store, and a second store given
 * the same steps by the command line holds the same control scripts.
 */
@ExtendWith(ApplicationExtension.class)
class QualityStepTest {

    private static final List<String> RATERS = List.of("rater-a", "rater-b", "rater-c", "rater-d");
    /** Invented candidates of the demo roster (src/demo) and the demo exam's first task and its criteria. */
    private static final List<String> CONTROLS = List.of("H1001", "H1002", "H1003", "H1004");
    private static final String TASK = "ferry-complaint";
    private static final String AGREED = "task-fulfilment=6, language-control=5";

    @TempDir
    Path dir;
    private Stage stage;

    @Start
    void start(Stage primary) {
        this.stage = primary;
    }

    @Test
    void controlsMonitorAndReferrals_inTheWindow_matchTheCommandLine(FxRobot robot) throws Exception {
        RatedStore inWindow = RatedStore.make(dir.resolve("window"), RATERS);
        RatedStore byCommand = RatedStore.make(dir.resolve("command"), RATERS);
        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));
        StepDriver.select(robot, "Rating administration");
        StepDriver.setText(robot, "#ratingStore", inWindow.file().toString());

        for (String candidate : CONTROLS) {
            StepDriver.setText(robot, "#controlCandidate", candidate);
            StepDriver.setText(robot, "#controlTask", TASK);
            StepDriver.setText(robot, "#controlAgreed", AGREED);
            StepDriver.setText(robot, "#controlSource", "invented standardisation meeting");
            StepDriver.press(robot, "#markControl");
            StepDriver.waitForWork(session);
            assertEquals("Marked: candidate " + candidate + ", task " + TASK + ". Put it into the queues with Mix into"
                    + " queues.", StepDriver.label(robot, "#ratingMessage"));
        }
        StepDriver.setText(robot, "#controlSeed", "11");
        StepDriver.press(robot, "#mixControls");
        StepDriver.waitForWork(session);
        String mixed = StepDriver.label(robot, "#ratingMessage");

        String other = byCommand.file().toString();
        for (String candidate : CONTROLS) {
            CommandLineSitting.admin("rate", "control", "mark", "--candidate", candidate, "--task", TASK, "--agreed",
                    AGREED.replace(" ", ""), "--source", "invented standardisation meeting", "--store", other);
        }
        String printed = CommandLineSitting.admin("rate", "control", "mix", "--seed", "11", "--store", other);
        assertEquals(printed.strip(), mixed.strip());
        List<ControlScripts.Control> shown = rows(robot, "#controlScripts");
        assertEquals(CONTROLS.size(), shown.size());
        try (RatingStore s = byCommand.open()) {
            assertEquals(s.controls(), shown);
        }
        assertEquals(CommandLineSitting.admin("rate", "control", "list", "--store", other),
                CommandLineSitting.admin("rate", "control", "list", "--store", inWindow.file().toString()));

        // every rater scores its control items at the agreed scores, except rater-a's later half: 3 points over
        rateControls(inWindow.file());
        StepDriver.press(robot, "#refreshRating");
        StepDriver.waitForWork(session);
        List<ControlMonitor.RaterReport> monitor = rows(robot, "#raterMonitor");
        assertEquals(RATERS, monitor.stream().map(ControlMonitor.RaterReport::raterId).toList());
        StringWriter out = new StringWriter();
        CommandLine cli = InkgateAdmin.commandLine();
        cli.setOut(new PrintWriter(out, true));
        assertEquals(InkgateAdmin.ATTENTION, cli.execute("rate", "monitor", "--store", inWindow.file().toString()));
        for (ControlMonitor.RaterReport r : monitor) {
            String line = out.toString().lines().filter(l -> l.strip().startsWith(r.raterId() + " ")).findFirst()
                    .orElseThrow();
            assertEquals(r.flagged(), line.contains("FLAGGED: " + String.join("; ", r.flags())), line);
            assertTrue(line.contains(String.format(java.util.Locale.ROOT, "%+9.2f", r.meanDifference())), line);
        }
        ControlMonitor.RaterReport a = monitor.get(0);
        assertTrue(a.flags().contains("drift +3.00 beyond +-1.00"), a.flags().toString());
        assertTrue(monitor.subList(1, monitor.size()).stream().noneMatch(ControlMonitor.RaterReport::flagged));
        assertEquals(List.of("rater-a"), flaggedRows(robot));

        // tighter limits typed in the window flag what the command flags with the same limits
        StepDriver.setText(robot, "#monitorMaxDrift", "");
        StepDriver.setText(robot, "#monitorMaxMean", "");
        StepDriver.setText(robot, "#monitorMinAdjacent", "");
        StepDriver.press(robot, "#applyMonitorLimits");
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(List.of(), flaggedRows(robot), "no limit, no flag");

        // a rater refers a script; the test owner sees it with the candidate number and decides in the window
        String candidate;
        try (RatingStore s = inWindow.open()) {
            String blind = s.queue("rater-b").get(0).blindId();
            s.refer("rater-b", blind, Referrals.Reason.IDENTITY_REVEALED, "signs the letter with a full name");
            candidate = s.referrals(false).get(0).candidateNumber();
        }
        StepDriver.press(robot, "#refreshRating");
        StepDriver.waitForWork(session);
        List<Referrals.Referral> referrals = rows(robot, "#referrals");
        assertEquals(1, referrals.size());
        assertEquals(candidate, referrals.get(0).candidateNumber());
        assertTrue(referrals.get(0).open());
        StepDriver.setText(robot, "#referralId", Long.toString(referrals.get(0).id()));
        StepDriver.setText(robot, "#referralBy", "Chief examiner (invented)");
        StepDriver.setText(robot, "#referralDecision", "rate as usual; name removed from the copy");
        StepDriver.press(robot, "#decideReferral");
        StepDriver.waitForWork(session);
        assertEquals("Referral " + referrals.get(0).id() + " decided.", StepDriver.label(robot, "#ratingMessage"));
        String listed = CommandLineSitting.admin("rate", "referrals", "list", "--store", inWindow.file().toString());
        assertTrue(listed.contains("decided by Chief examiner (invented)") && listed.contains("name removed"), listed);
        List<Referrals.Referral> after = rows(robot, "#referrals");
        assertEquals("Chief examiner (invented)", after.get(0).decidedBy());
        pictures(robot);
    }

    /** The referrals and the control scripts at 1024x768, for docs/test-owner-guide.md. */
    private void pictures(FxRobot robot) throws Exception {
        robot.interact(() -> {
            stage.setWidth(1024);
            stage.setHeight(768);
        });
        StepDriver.scrollTo(robot, "#referrals", 150);
        StepDriver.shoot1024(robot, stage, "admin-rating-referrals.png");
        StepDriver.scrollTo(robot, "#controlScripts", 150);
        StepDriver.shoot1024(robot, stage, "admin-rating-controls.png");
    }

    @Test
    void markControl_badScores_saysHowToFixAndMarksNothing(FxRobot robot) throws Exception {
        RatedStore store = RatedStore.make(dir.resolve("s"), RATERS);
        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));
        StepDriver.select(robot, "Rating administration");
        StepDriver.setText(robot, "#ratingStore", store.file().toString());
        StepDriver.setText(robot, "#controlCandidate", "H1001");
        StepDriver.setText(robot, "#controlTask", TASK);
        StepDriver.setText(robot, "#controlAgreed", "task-fulfilment=six");
        StepDriver.setText(robot, "#controlSource", "invented");
        StepDriver.press(robot, "#markControl");
        StepDriver.waitForWork(session);
        assertEquals("The control script was not marked: \"task-fulfilment=six\": give the scores as"
                + " CRITERION=WHOLE-NUMBER once per criterion, separated by commas, e.g. content=5, language=6.",
                StepDriver.label(robot, "#ratingMessage"));
        StepDriver.setText(robot, "#monitorMaxDrift", "a lot");
        StepDriver.press(robot, "#applyMonitorLimits");
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(StepDriver.label(robot, "#ratingMessage").startsWith("The monitor limits were not applied: Largest"
                + " drift \"a lot\" is not a number"), StepDriver.label(robot, "#ratingMessage"));
        try (RatingStore s = store.open()) {
            assertEquals(List.of(), s.controls());
        }
    }

    /** Issue 15: an accessible name on every control of the rating step (tables by their own name, not their cells). */
    @Test
    void ratingStep_everyControlHasAnAccessibleName(FxRobot robot) {
        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));
        StepDriver.select(robot, "Rating administration");
        javafx.scene.Node view = robot.lookup("#ratingStore").query().getParent();
        while (!view.getStyleClass().contains("step")) {
            view = view.getParent();
        }
        int checked = 0;
        for (javafx.scene.Node n : robot.from(view).lookup((java.util.function.Predicate<javafx.scene.Node>) n ->
                n instanceof javafx.scene.control.Control && !(n instanceof javafx.scene.control.Label)
                        && !(n instanceof javafx.scene.control.ScrollBar) && !insideTable(n)).queryAll()) {
            assertTrue(n.getAccessibleText() != null && !n.getAccessibleText().isBlank(), n + " has no accessible name");
            checked++;
        }
        assertTrue(checked >= 45, "controls checked: " + checked);
    }

    private static boolean insideTable(javafx.scene.Node n) {
        for (javafx.scene.Node p = n.getParent(); p != null; p = p.getParent()) {
            if (p instanceof TableView) {
                return true;
            }
        }
        return false;
    }

    /** Control items of every rater, rated at the agreed scores; rater-a's later half 3 points above. */
    private static void rateControls(Path store) throws Exception {
        Map<String, List<String>> items = new HashMap<>();
        try (var c = DriverManager.getConnection("jdbc:sqlite:" + store); var ps = c.prepareStatement(
                "SELECT a.rater_id, a.blind_id FROM control_assignments ca JOIN rating_assignments a"
                        + " ON a.assignment_id = ca.assignment_id ORDER BY a.assignment_id");
                var rs = ps.executeQuery()) {
            while (rs.next()) {
                items.computeIfAbsent(rs.getString(1), k -> new ArrayList<>()).add(rs.getString(2));
            }
        }
        try (RatingStore s = Stores.openRating(StoreLocation.file(store), Stores.exams(StoreLocation.file(store)).get(0))) {
            for (String rater : RATERS) {
                List<String> ids = items.get(rater);
                // a control script never goes to a rater who already rates that response
                assertTrue(ids != null && ids.size() >= (rater.equals("rater-a") ? 2 : 1),
                        rater + " holds control items: " + ids);
                for (int i = 0; i < ids.size(); i++) {
                    int over = rater.equals("rater-a") && i >= ids.size() - ids.size() / 2 ? 3 : 0;
                    s.submit(rater, ids.get(i), new RatingSheet(Map.of("task-fulfilment", 6 + over,
                            "language-control", 5 + over), ""));
                }
            }
        }
    }

    private static List<String> flaggedRows(FxRobot robot) {
        WaitForAsyncUtils.waitForFxEvents();
        List<String> out = new ArrayList<>();
        robot.lookup("#raterMonitor").queryAs(TableView.class).lookupAll("." + QualityPanels.FLAGGED_ROW)
                .forEach(n -> out.add(((ControlMonitor.RaterReport) ((TableRow<?>) n).getItem()).raterId()));
        return out;
    }

    @SuppressWarnings("unchecked")
    private static <S> List<S> rows(FxRobot robot, String query) {
        WaitForAsyncUtils.waitForFxEvents();
        return List.copyOf(robot.lookup(query).queryAs(TableView.class).getItems());
    }
}
