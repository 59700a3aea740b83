package org.inkgate.admin.gui.ratingadmin;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.TableView;
import javafx.stage.Stage;
import org.inkgate.admin.core.rating.RatingDesk.RatingSheet;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.core.source.ExamSource;
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

/**
 * Issue 15 §2 (rating administration), driven as a test owner would on a store the real collect
 * made: raters with a capacity, a seeded assignment with its linkage, progress, a discrepancy
 * rule, the flags it raises and a resolution entry; the same steps through {@code inkgate-admin
 * rate} on a second, identical store give the same assignment, progress and flags.
 */
@ExtendWith(ApplicationExtension.class)
class RatingAdminStepTest {

    private static final String SEED = "4242";

    @TempDir
    Path dir;
    private Stage stage;

    @Start
    void start(Stage primary) {
        this.stage = primary;
    }

    @Test
    void ratingAdministration_windowAndCommand_sameAssignmentProgressAndFlags(FxRobot robot) throws Exception {
        RatedStore inWindow = RatedStore.collected(dir.resolve("window"));
        RatedStore byCommand = RatedStore.collected(dir.resolve("command"));
        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));
        StepDriver.select(robot, "Rating administration");
        StepDriver.setText(robot, "#ratingStore", inWindow.file().toString());
        addRater(robot, session, "R1", "");
        addRater(robot, session, "R2", "");
        addRater(robot, session, "R3", "10");
        assertEquals("Added rater R3 (capacity 10)", StepDriver.label(robot, "#ratingMessage"));
        robot.interact(() -> robot.lookup("#ratersPerResponse").queryAs(ChoiceBox.class).setValue("2"));
        StepDriver.setText(robot, "#ratingSeed", SEED);
        List<Double> bar = new java.util.concurrent.CopyOnWriteArrayList<>();
        robot.interact(() -> session.work().progress().addListener((o, was, now) -> bar.add(now.doubleValue())));
        StepDriver.press(robot, "#assignRatings");
        StepDriver.waitForWork(session);
        // the status bar counts the action's stages (a fraction of the whole), not an endless spinner (-1)
        assertTrue(bar.stream().anyMatch(v -> v > 0 && v < 1), "progress values shown: " + bar);
        String assigned = StepDriver.label(robot, "#ratingMessage");

        String store = byCommand.file().toString();
        CommandLineSitting.admin("rate", "raters", "add", "R1", "--store", store);
        CommandLineSitting.admin("rate", "raters", "add", "R2", "--store", store);
        CommandLineSitting.admin("rate", "raters", "add", "R3", "--capacity", "10", "--store", store);
        String printed = CommandLineSitting.admin("rate", "assign", "--seed", SEED, "--store", store);
        assertEquals(printed.strip(), assigned.strip());

        // the demo roster has 12 invented candidates with 2 tasks each (src/demo): 24 responses, 2 raters each;
        // R3 may take 10, so the other 38 ratings split evenly between R1 and R2
        List<RatingStore.ProgressRow> shown = rows(robot, "#ratingProgress");
        assertEquals(48, shown.stream().mapToInt(RatingStore.ProgressRow::total).sum());
        assertEquals(Map.of("R1", 19, "R2", 19, "R3", 10), workloads(shown));
        assertTrue(StepDriver.label(robot, "#ratingState").contains("Rater links: connected"),
                StepDriver.label(robot, "#ratingState"));
        try (RatingStore s = byCommand.open()) {
            assertEquals(s.progressRows(), shown);
        }

        // planted disagreement: R2 gives the top of every band, R1 and R3 the bottom (as desk raters would submit)
        rateAll(inWindow);
        rateAll(byCommand);
        StepDriver.setText(robot, "#criterionGap", "1");
        StepDriver.press(robot, "#setRule");
        StepDriver.waitForWork(session);
        String ruleSet = StepDriver.label(robot, "#ratingMessage");
        String rulePrinted = CommandLineSitting.admin("rate", "rule", "--criterion-gap", "1", "--store", store);
        assertEquals(rulePrinted.strip().replace("; see rate flags.", "."), ruleSet.strip());
        List<RatingStore.Flag> flags = rows(robot, "#flags");
        // every response R2 rated disagrees by the whole band range with its partner: R2's 19 responses
        assertEquals(19, flags.size());
        try (RatingStore s = byCommand.open()) {
            assertEquals(comparable(s.flags()), comparable(flags));
        }

        StepDriver.shoot1024(robot, stage, "admin-rating-flags.png");
        StepDriver.scrollTo(robot, "#ratingMessage", 20);
        StepDriver.shoot1024(robot, stage, "admin-rating-administration.png");

        // a resolution entry settles the first flag, as rate resolve does
        ExamSource.Rubric rubric = inWindow.exam().rubric();
        StringBuilder scores = new StringBuilder();
        rubric.criteria().forEach(c -> scores.append(scores.isEmpty() ? "" : ", ").append(c.id()).append('=')
                .append(c.minScore()));
        long first = flags.get(0).flagId();
        StepDriver.setText(robot, "#resolveFlagId", Long.toString(first));
        StepDriver.setText(robot, "#resolveBy", "Chief examiner (invented)");
        StepDriver.setText(robot, "#resolveScores", scores.toString());
        StepDriver.setText(robot, "#resolveComment", "agreed in discussion");
        StepDriver.press(robot, "#resolveFlag");
        StepDriver.waitForWork(session);
        assertEquals("Flag " + first + " settled by resolution entry of Chief examiner (invented).",
                StepDriver.label(robot, "#ratingMessage"));
        // the command sees the window's resolution entry: exit 3 because the other flags are still open
        java.io.StringWriter out = new java.io.StringWriter();
        picocli.CommandLine cl = org.inkgate.admin.cli.InkgateAdmin.commandLine();
        cl.setOut(new java.io.PrintWriter(out, true));
        assertEquals(3, cl.execute("rate", "flags", "--store", inWindow.file().toString()));
        String listed = out.toString();
        assertTrue(listed.contains("flag " + first + "  "), listed);
        assertTrue(listed.lines().dropWhile(l -> !l.contains("flag " + first + "  ")).skip(1).findFirst().orElseThrow()
                .contains("settled"), listed);
        List<RatingStore.Flag> after = rows(robot, "#flags");
        assertTrue(after.get(0).status().startsWith("settled"), after.get(0).status());
    }

    @Test
    void addRater_badCapacity_saysHowToFixAndAddsNobody(FxRobot robot) throws Exception {
        RatedStore store = RatedStore.collected(dir.resolve("s"));
        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));
        StepDriver.select(robot, "Rating administration");
        StepDriver.setText(robot, "#ratingStore", store.file().toString());
        addRater(robot, session, "R1", "ten");
        assertEquals("Capacity \"ten\" is not a whole number; leave it blank for no limit.",
                StepDriver.label(robot, "#ratingMessage"));
        try (RatingStore s = store.open()) {
            assertEquals(List.of(), s.raterEntries());
        }
    }

    private static void addRater(FxRobot robot, AdminSession session, String id, String capacity) throws Exception {
        StepDriver.setText(robot, "#raterId", id);
        StepDriver.setText(robot, "#raterCapacity", capacity);
        StepDriver.press(robot, "#addRater");
        StepDriver.waitForWork(session);
    }

    private static void rateAll(RatedStore store) throws Exception {
        try (RatingStore s = store.open()) {
            for (String rater : List.of("R1", "R2", "R3")) {
                for (var q : s.queue(rater)) {
                    java.util.Map<String, Integer> scores = new java.util.HashMap<>();
                    s.rubric(q.blindId()).criteria().forEach(c -> scores.put(c.id(),
                            rater.equals("R2") ? c.maxScore() : c.minScore()));
                    s.submit(rater, q.blindId(), new RatingSheet(scores, ""));
                }
            }
        }
    }

    private static Map<String, Integer> workloads(List<RatingStore.ProgressRow> rows) {
        Map<String, Integer> w = new java.util.TreeMap<>();
        rows.forEach(r -> w.merge(r.raterId(), r.total(), Integer::sum));
        return w;
    }

    /** A flag without what differs between two stores by design: blind ids and clock times. */
    private static List<String> comparable(List<RatingStore.Flag> flags) {
        List<String> out = new ArrayList<>();
        flags.forEach(f -> out.add(f.flagId() + " " + f.taskId() + " " + f.raters() + " " + f.reason() + " "
                + f.adjudicator() + " " + f.finalMethod()));
        return out;
    }

    @SuppressWarnings("unchecked")
    private static <S> List<S> rows(FxRobot robot, String query) {
        WaitForAsyncUtils.waitForFxEvents();
        return List.copyOf(robot.lookup(query).queryAs(TableView.class).getItems());
    }
}
