package org.inkgate.admin.hostile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.inkgate.admin.cli.InkgateAdmin;
import org.inkgate.admin.testutil.ForgedPackages;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code analyse --ratings} over a sheet with scores no rubric gives (negative, 5000, 1e308): refused
 * with the row and column of each, and no report written. The other rows are the Shrout and Fleiss
 * (1979) Table 2 ratings, a public worked example.
 */
class ImpossibleScoresTest {

    @TempDir
    Path dir;

    @Test
    void analyse_negativeHugeAndOverflowingScores_refusedWithRowAndColumn() throws Exception {
        int[][] t = {{9, 2, 5, 8}, {6, 1, 3, 2}, {8, 4, 6, 8}, {7, 1, 2, 6}, {10, 5, 6, 9}, {6, 2, 4, 7}};
        StringBuilder csv = new StringBuilder("candidate,level,form,task,condition,rater,criterion,score\n");
        for (int i = 0; i < 6; i++) {
            for (int j = 0; j < 4; j++) {
                String score = String.valueOf(t[i][j]);
                int row = 2 + i * 4 + j;
                score = row == 3 ? "-2" : row == 7 ? "5000" : row == 11 ? "1e308" : score;
                csv.append("T").append(i + 1).append(",,,t1,plain,J").append(j + 1).append(",overall,").append(score)
                        .append('\n');
            }
        }
        Path ratings = Files.writeString(dir.resolve("ratings.csv"), csv);
        Path report = dir.resolve("report");
        ForgedPackages.Run run = ForgedPackages.here("analyse", "--ratings", ratings.toString(), "--out", report.toString());
        assertEquals(InkgateAdmin.PROBLEMS, run.code(), run.out());
        assertTrue(run.out().contains("ratings.csv, row 3, column score: score -2 is negative"), run.out());
        assertTrue(run.out().contains("ratings.csv, row 7, column score: score 5000 is beyond any rubric"), run.out());
        assertTrue(run.out().contains("ratings.csv, row 11, column score: score 1.0E308 is beyond any rubric"), run.out());
        assertFalse(Files.exists(report.resolve("report.html")));
    }
}
