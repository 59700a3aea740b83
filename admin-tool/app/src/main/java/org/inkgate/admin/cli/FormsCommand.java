package org.inkgate.admin.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.security.SecureRandom;
import java.util.List;
import java.util.concurrent.Callable;
import org.inkgate.admin.core.forms.Assignment;
import org.inkgate.admin.core.forms.AssignmentCounts;
import org.inkgate.admin.core.forms.AssignmentTable;
import org.inkgate.admin.core.forms.DesignSummary;
import org.inkgate.admin.core.forms.FormAssignment;
import org.inkgate.admin.core.forms.FormDesigner;
import org.inkgate.admin.core.roster.RosterCandidate;
import org.inkgate.admin.core.roster.RosterReader;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.admin.core.source.InvalidSourceException;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.FormSpec;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code forms}: shows the generated forms and, with a roster, assigns candidates to them. */
@Command(name = "forms", description = "Show the forms an exam source generates; with --roster, assign candidates"
        + " to forms balanced within each level (seeded) and write the assignment table.")
final class FormsCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(paramLabel = "EXAM_DIR", description = "the exam source folder")
    Path folder;

    @Option(names = "--roster", paramLabel = "CSV", description = "roster to assign (candidate_number, level, ...)")
    Path roster;

    @Option(names = "--seed", paramLabel = "N", description = "seed of the random assignment; a new one is drawn and"
            + " printed when left out")
    Long seed;

    @Option(names = "--out", paramLabel = "CSV", description = "write the assignment table here")
    Path out;

    @Option(names = "--replace", description = "replace an existing assignment table at --out (a bundle built from the"
            + " old table would no longer match it)")
    boolean replace;

    @Override
    public Integer call() throws Exception {
        PrintWriter w = spec.commandLine().getOut();
        ExamSource exam;
        List<RosterCandidate> candidates = null;
        try {
            exam = ExamSourceReader.read(folder);
            if (roster != null) {
                candidates = RosterReader.read(roster);
            }
        } catch (InvalidSourceException e) {
            spec.commandLine().getErr().println(e.getMessage());
            return InkgateAdmin.PROBLEMS;
        }
        List<FormSpec> forms = FormDesigner.forms(exam);
        DesignSummary.lines(exam, forms).forEach(w::println);
        w.println(forms.size() + " forms (" + exam.design().kind().word() + "):");
        for (FormSpec f : forms) {
            StringBuilder line = new StringBuilder("  " + f.id() + ":");
            for (FormSlot s : f.slots()) {
                line.append("  ").append(s.taskId()).append(" [").append(s.conditionId()).append(']');
            }
            w.println(line);
        }
        if (candidates == null) {
            return InkgateAdmin.OK;
        }
        long usedSeed = seed != null ? seed : new SecureRandom().nextLong();
        FormAssignment.Result result;
        try {
            result = FormAssignment.assign(exam, forms, candidates, usedSeed);
        } catch (InvalidSourceException e) {
            spec.commandLine().getErr().println(e.getMessage());
            return InkgateAdmin.PROBLEMS;
        }
        Assignment a = result.assignment();
        w.println();
        w.println("Assignment of " + a.rows().size() + " candidates, seed " + usedSeed
                + " (the same seed and roster give the same assignment); candidates per level and form:");
        printCounts(w, result, forms);
        if (out != null) {
            try {
                AssignmentTable.write(a, out, replace);
            } catch (AssignmentTable.ExistsException e) {
                spec.commandLine().getErr().println(e.getMessage());
                return InkgateAdmin.PROBLEMS;
            }
            w.println("Assignment table written to " + out + " (one row per candidate, with the seed).");
        } else {
            w.println();
            w.print(AssignmentTable.csv(a).replace("\r\n", System.lineSeparator()));
        }
        return InkgateAdmin.OK;
    }

    static void printCounts(PrintWriter w, FormAssignment.Result result, List<FormSpec> forms) {
        AssignmentCounts counts = result.counts();
        StringBuilder head = new StringBuilder(String.format("  %-12s", "level"));
        forms.forEach(f -> head.append(String.format("%6s", f.id())));
        w.println(head);
        for (String level : counts.byLevel().keySet()) {
            StringBuilder row = new StringBuilder(String.format("  %-12s", level));
            forms.forEach(f -> row.append(String.format("%6d", counts.count(level, f.id()))));
            w.println(row);
        }
        result.balance().forEach(line -> w.println("  " + line));
    }
}
