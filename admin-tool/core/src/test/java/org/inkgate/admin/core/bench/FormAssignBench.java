package org.inkgate.admin.core.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import org.inkgate.admin.core.forms.Assignment;
import org.inkgate.admin.core.forms.AssignmentCounts;
import org.inkgate.admin.core.forms.FormAssigner;
import org.inkgate.admin.core.forms.FormDesigner;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.admin.core.testutil.ExamFolders;
import org.inkgate.format.bundle.FormSpec;

/**
 * Bench command (not a test): times the seeded form assignment (the leftover search) on
 * Latin-square designs of growing size, 8 levels of 20-79 invented candidates each (seeded sizes),
 * and prints the median of the runs and the largest distance from an even split it reached.
 * Arguments: folder for the invented exam sources, runs per design.
 */
public final class FormAssignBench {

    private FormAssignBench() {
    }

    public static void main(String[] args) throws Exception {
        Path root = Files.createDirectories(Path.of(args[0]));
        int runs = Integer.parseInt(args[1]);
        int[][] designs = {{2, 2}, {3, 3}, {4, 4}, {5, 3}, {6, 4}};
        List<FormAssigner.Candidate> roster = new ArrayList<>();
        Random sizes = new Random(1);
        for (int l = 0; l < 8; l++) {
            int n = 20 + sizes.nextInt(60);
            for (int i = 0; i < n; i++) {
                roster.add(new FormAssigner.Candidate(String.format("L%d-%03d", l, i), "L" + l));
            }
        }
        for (int[] d : designs) {
            ExamSource exam = ExamSourceReader.read(ExamFolders.withTasks(root.resolve(d[0] + "x" + d[1]), d[0], d[1],
                    "latin-square", true));
            List<FormSpec> forms = FormDesigner.forms(exam);
            double[] ms = new double[runs];
            Assignment a = null;
            for (int r = 0; r < runs; r++) {
                long t = System.nanoTime();
                a = FormAssigner.assign(roster, forms, FormDesigner.blockSize(exam), 42);
                ms[r] = (System.nanoTime() - t) / 1e6;
            }
            Arrays.sort(ms);
            List<String> lines = AssignmentCounts.of(a, forms).lines();
            System.out.printf("%d tasks x %d conditions, %d forms, %d candidates: median %.0f ms; %s%n", d[0], d[1],
                    forms.size(), roster.size(), ms[runs / 2], lines.get(lines.size() - 1));
        }
    }
}
