package org.inkgate.admin.gui.ratingadmin;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import javafx.stage.Stage;
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

/**
 * Issue 15 §2 (rating sheets out and in, final scores), driven as a test owner would on a store
 * the real collect made: the window writes the same sheet and scripts as {@code rate sheet export},
 * reads filled sheets back, and writes the same ratings and final scores as {@code rate export}.
 */
@ExtendWith(ApplicationExtension.class)
class RatingSheetsStepTest {

    @TempDir
    Path dir;
    private Stage stage;

    @Start
    void start(Stage primary) {
        this.stage = primary;
    }

    @Test
    void sheets_outAndIn_thenFinalScores_sameFilesAsTheCommand(FxRobot robot) throws Exception {
        RatedStore rated = RatedStore.make(dir.resolve("study"), List.of("R1", "R2"));
        String store = rated.file().toString();
        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));
        StepDriver.select(robot, "Rating administration");
        StepDriver.setText(robot, "#ratingStore", store);

        for (String rater : List.of("R1", "R2")) {
            Path sheet = dir.resolve("window").resolve(rater + ".csv");
            StepDriver.setText(robot, "#sheetRater", rater);
            StepDriver.setText(robot, "#sheetFile", sheet.toString());
            StepDriver.press(robot, "#exportSheet");
            StepDriver.waitForWork(session);
            Path bySheetCommand = dir.resolve("command").resolve(rater + ".csv");
            String printed = CommandLineSitting.admin("rate", "sheet", "export", "--rater", rater, "--out",
                    bySheetCommand.toString(), "--store", store);
            assertEquals(printed.strip(), StepDriver.label(robot, "#ratingMessage")
                    .replace(sheet.getParent().toString(), bySheetCommand.getParent().toString()).strip());
            assertArrayEquals(Files.readAllBytes(bySheetCommand), Files.readAllBytes(sheet));
            assertEquals(tree(bySheetCommand.resolveSibling(rater + "-scripts")), tree(sheet.resolveSibling(rater + "-scripts")));

            fill(sheet, rated.exam().rubric());
            StepDriver.press(robot, "#importSheet");
            StepDriver.waitForWork(session);
            // the demo roster (src/demo): 12 invented candidates, 2 tasks each; with two raters and two raters per
            // response, each rater has all 24 responses
            assertEquals("Read 24 rows: 24 ratings stored (new or changed), 0 not yet rated, the rest unchanged.",
                    StepDriver.label(robot, "#ratingMessage"));
        }

        Path windowScores = dir.resolve("window-scores");
        StepDriver.setText(robot, "#scoresFolder", windowScores.toString());
        StepDriver.press(robot, "#exportScores");
        StepDriver.waitForWork(session);
        Path commandScores = dir.resolve("command-scores");
        String printed = CommandLineSitting.admin("rate", "export", "--out", commandScores.toString(), "--store", store);
        assertEquals(printed.strip(), StepDriver.label(robot, "#ratingMessage")
                .replace(windowScores.toString(), commandScores.toString()).strip());
        for (String f : List.of("ratings.csv", "final-scores.csv")) {
            assertArrayEquals(Files.readAllBytes(commandScores.resolve(f)), Files.readAllBytes(windowScores.resolve(f)), f);
        }
        // 24 responses x 2 raters x the rubric's criteria, one rating per row
        int criteria = rated.exam().rubric().criteria().size();
        assertTrue(printed.startsWith("ratings.csv " + 24 * 2 * criteria + " rows"), printed);
    }

    /** Fills every row of a sheet with the bottom of each criterion's band range, as a rater would in a spreadsheet. */
    private static void fill(Path sheet, ExamSource.Rubric rubric) throws Exception {
        List<String> lines = Files.readAllLines(sheet, StandardCharsets.UTF_8);
        List<String> out = new ArrayList<>(List.of(lines.get(0)));
        for (String line : lines.subList(1, lines.size())) {
            String[] cells = line.split(",", -1);
            for (int i = 0; i < rubric.criteria().size(); i++) {
                cells[2 + i] = Integer.toString(rubric.criteria().get(i).minScore());
            }
            out.add(String.join(",", cells));
        }
        Files.write(sheet, out, StandardCharsets.UTF_8);
    }

    private static List<String> tree(Path folder) throws Exception {
        List<String> all = new ArrayList<>();
        try (Stream<Path> s = Files.walk(folder)) {
            for (Path p : s.filter(Files::isRegularFile).sorted().toList()) {
                all.add(folder.relativize(p) + " " + java.util.HexFormat.of().formatHex(
                        java.security.MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(p))));
            }
        }
        return all;
    }
}
