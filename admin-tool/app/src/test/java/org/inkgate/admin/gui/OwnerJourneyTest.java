package org.inkgate.admin.gui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import javafx.scene.control.CheckBox;
import javafx.scene.control.TableView;
import javafx.scene.control.TextArea;
import javafx.scene.web.WebView;
import javafx.stage.Stage;
import org.inkgate.admin.core.rating.RatingDesk.RatingSheet;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;
import org.inkgate.admin.testutil.CommandLineSitting;
import org.inkgate.admin.testutil.DemoSource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Issue 15's first check, one journey: a test owner opens a bundle the command line built last
 * week, and in the window alone checks the exam, collects, adds raters and assigns, follows
 * progress as raters score, sets a discrepancy rule, settles the flags by resolution entries,
 * writes the final scores, exports and opens the analysis report inside the window. The same
 * steps through {@code inkgate-admin} on a second store from the same packages give the same
 * assignment, flags and final scores (rows compared, the clock column aside).
 */
@ExtendWith(ApplicationExtension.class)
class OwnerJourneyTest {

    private static final Path EXAM = DemoSource.DEMO.resolve("exam-source");
    private static final Path ROSTER = DemoSource.DEMO.resolve("roster.csv").toAbsolutePath();
    private static final List<String> RATERS = List.of("R1", "R2", "R3");
    private static final String SEED = "777";

    @TempDir
    Path dir;
    private Stage stage;

    @Start
    void start(Stage primary) {
        this.stage = primary;
    }

    @Test
    void testOwner_bundleFromTheCommandLine_toReportInTheWindow_sameResultsAsTheCommandLine(FxRobot robot)
            throws Exception {
        Path bundle = CommandLineSitting.prepare(EXAM, ROSTER, 20261202, dir);
        Path packages = dir.resolve("packages");
        CommandLineSitting.packages(dir.resolve("keys"), bundle, packages, "");
        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));

        StepDriver.select(robot, "Exam check");
        StepDriver.setText(robot, "#examFolder", EXAM.toAbsolutePath().toString());
        StepDriver.press(robot, "#checkExam");
        WaitForAsyncUtils.waitFor(60, TimeUnit.SECONDS, () -> session.exam().get() != null);

        StepDriver.select(robot, "Collect");
        Path store = dir.resolve("window").resolve("results.db");
        Files.createDirectories(store.getParent());
        StepDriver.setText(robot, "#collectBundle", bundle.toString());
        StepDriver.setText(robot, "#collectKeys", dir.resolve("keys").toString());
        StepDriver.setText(robot, "#collectAssignment", dir.resolve("assignment.csv").toString());
        StepDriver.setText(robot, "#collectRoster", ROSTER.toString());
        StepDriver.setText(robot, "#storeFile", store.toString());
        robot.interact(() -> robot.lookup("#packageFolders").queryAs(TextArea.class).setText(packages.toString()));
        robot.interact(() -> robot.lookup("#anyInstallation").queryAs(CheckBox.class).setSelected(true));
        StepDriver.setText(robot, "#collectPassphrase", CommandLineSitting.passphrase());
        StepDriver.press(robot, "#collect");
        StepDriver.waitForWork(session);
        assertTrue(StepDriver.label(robot, "#collectCounts").startsWith("Imported 12, "),
                StepDriver.label(robot, "#collectCounts"));

        // rating administration takes over the store collect named
        StepDriver.select(robot, "Rating administration");
        assertEquals(store.toString(), robot.lookup("#ratingStore").queryTextInputControl().getText());
        for (String r : RATERS) {
            StepDriver.setText(robot, "#raterId", r);
            StepDriver.press(robot, "#addRater");
            StepDriver.waitForWork(session);
        }
        StepDriver.setText(robot, "#ratingSeed", SEED);
        StepDriver.press(robot, "#assignRatings");
        StepDriver.waitForWork(session);
        String assigned = StepDriver.label(robot, "#ratingMessage");
        List<RatingStore.ProgressRow> before = rows(robot, "#ratingProgress");
        assertEquals(48, before.stream().mapToInt(RatingStore.ProgressRow::total).sum(), "24 responses, 2 raters");
        assertEquals(0, before.stream().mapToInt(RatingStore.ProgressRow::rated).sum());

        // the raters score at their desks (the desk's own tests drive it by keyboard); the owner follows progress
        score(store);
        StepDriver.press(robot, "#refreshRating");
        StepDriver.waitForWork(session);
        List<RatingStore.ProgressRow> after = rows(robot, "#ratingProgress");
        assertEquals(48, after.stream().mapToInt(RatingStore.ProgressRow::rated).sum());

        StepDriver.setText(robot, "#criterionGap", "1");
        StepDriver.press(robot, "#setRule");
        StepDriver.waitForWork(session);
        List<RatingStore.Flag> flags = rows(robot, "#flags");
        assertEquals(2, flags.size(), "R2's two planted disagreements");
        for (RatingStore.Flag f : flags) {
            StepDriver.setText(robot, "#resolveFlagId", Long.toString(f.flagId()));
            StepDriver.setText(robot, "#resolveBy", "Chief examiner (invented)");
            StepDriver.setText(robot, "#resolveScores", "task-fulfilment=5, language-control=4");
            StepDriver.setText(robot, "#resolveComment", "agreed in discussion");
            StepDriver.press(robot, "#resolveFlag");
            StepDriver.waitForWork(session);
        }
        assertTrue(StepDriver.label(robot, "#ratingState").contains("Every assigned response has a final score."),
                StepDriver.label(robot, "#ratingState"));
        Path scores = dir.resolve("window-scores");
        StepDriver.setText(robot, "#scoresFolder", scores.toString());
        StepDriver.press(robot, "#exportScores");
        StepDriver.waitForWork(session);

        StepDriver.select(robot, "Exports");
        StepDriver.setText(robot, "#exportFolder", dir.resolve("window-export").toString());
        StepDriver.press(robot, "#export");
        StepDriver.waitForWork(session);
        assertTrue(StepDriver.label(robot, "#exportWritten").contains("qti-results/ 12 assessmentResult files (24 task"
                + " results with a final score)"), StepDriver.label(robot, "#exportWritten"));

        StepDriver.select(robot, "Analyse");
        StepDriver.setText(robot, "#analysisOut", dir.resolve("window-report").toString());
        StepDriver.press(robot, "#analyse");
        StepDriver.waitForWork(session);
        assertTrue(StepDriver.label(robot, "#analysisResult").startsWith("Report written to "),
                StepDriver.label(robot, "#analysisResult"));
        StepDriver.press(robot, "#showReport");
        WebView web = robot.lookup("#reportView").queryAs(WebView.class);
        WaitForAsyncUtils.waitFor(60, TimeUnit.SECONDS, () -> WaitForAsyncUtils.asyncFx(() -> web.getEngine()
                .getLoadWorker().getState() == javafx.concurrent.Worker.State.SUCCEEDED).get());

        // the same journey on the command line, from the same bundle and packages
        String other = dir.resolve("command").resolve("results.db").toString();
        Files.createDirectories(dir.resolve("command"));
        CommandLineSitting.admin("collect", packages.toString(), "--store", other, "--bundle", bundle.toString(),
                "--keys", dir.resolve("keys").toString(), "--passphrase-env", CommandLineSitting.SECRET_ENV,
                "--any-installation", "--roster", ROSTER.toString(), "--exam", EXAM.toString(), "--assignment",
                dir.resolve("assignment.csv").toString());
        for (String r : RATERS) {
            CommandLineSitting.admin("rate", "raters", "add", r, "--store", other);
        }
        assertEquals(CommandLineSitting.admin("rate", "assign", "--seed", SEED, "--store", other).strip(),
                assigned.strip());
        score(Path.of(other));
        CommandLineSitting.admin("rate", "rule", "--criterion-gap", "1", "--store", other);
        for (RatingStore.Flag f : flags) {
            CommandLineSitting.admin("rate", "resolve", "--flag", Long.toString(f.flagId()), "--by",
                    "Chief examiner (invented)", "--score", "task-fulfilment=5,language-control=4", "--comment",
                    "agreed in discussion", "--store", other);
        }
        Path commandScores = dir.resolve("command-scores");
        CommandLineSitting.admin("rate", "export", "--out", commandScores.toString(), "--store", other);
        assertEquals(withoutLastColumn(commandScores.resolve("final-scores.csv")),
                withoutLastColumn(scores.resolve("final-scores.csv")), "final scores, decided_at aside");
    }

    /** Every rater scores the bottom band; R2 gives the top on its first two scripts (planted disagreements). */
    private static void score(Path store) throws Exception {
        try (RatingStore s = Stores.openRating(StoreLocation.file(store), Stores.exams(StoreLocation.file(store)).get(0))) {
            for (String rater : RATERS) {
                int n = 0;
                for (var q : s.queue(rater)) {
                    boolean planted = rater.equals("R2") && n++ < 2;
                    Map<String, Integer> scores = new HashMap<>();
                    s.rubric(q.blindId()).criteria().forEach(c -> scores.put(c.id(), planted ? c.maxScore() : c.minScore()));
                    s.submit(rater, q.blindId(), new RatingSheet(scores, ""));
                }
            }
        }
    }

    /** The CSV's rows without the last column (a clock time); candidate numbers and scores stay. */
    private static List<String> withoutLastColumn(Path csv) throws Exception {
        List<String> out = new ArrayList<>();
        for (String line : Files.readAllLines(csv)) {
            out.add(line.substring(0, line.lastIndexOf(',')));
        }
        assertTrue(out.size() > 24, csv + " holds a row per criterion of every response: " + out.size());
        return out;
    }

    @SuppressWarnings("unchecked")
    private static <S> List<S> rows(FxRobot robot, String query) {
        WaitForAsyncUtils.waitForFxEvents();
        return List.copyOf(robot.lookup(query).queryAs(TableView.class).getItems());
    }
}
