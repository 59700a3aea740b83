package org.inkgate.admin.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.inkgate.admin.core.roster.RosterCandidate;
import org.inkgate.admin.core.roster.RosterReader;
import org.inkgate.admin.core.roster.RosterSummary;
import org.inkgate.admin.core.source.InvalidSourceException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code roster}: checks a roster CSV and summarises it; every bad row is listed. */
@Command(name = "roster", description = "Check a roster CSV (candidate_number, level, first_language,"
        + " extra_time_percent, large_print, high_contrast, other columns kept as personal fields).")
final class RosterCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(paramLabel = "CSV", description = "the roster file (UTF-8, header row)")
    Path file;

    @Override
    public Integer call() {
        List<RosterCandidate> roster;
        try {
            roster = RosterReader.read(file);
        } catch (InvalidSourceException e) {
            spec.commandLine().getErr().println(e.getMessage());
            return InkgateAdmin.PROBLEMS;
        }
        PrintWriter w = spec.commandLine().getOut();
        RosterSummary summary = RosterSummary.of(roster);
        w.println(file + ": " + summary.candidates() + " candidates, no problems found.");
        w.println("  per level: " + summary.perLevel());
        w.println("  accommodations: extra time " + summary.extraTime() + ", large print " + summary.largePrint()
                + ", high contrast " + summary.highContrast());
        if (!summary.personalFields().isEmpty()) {
            w.println("  personal fields " + summary.personalFields() + " stay in the results store; they never go into"
                    + " bundles or rater exports.");
        }
        return InkgateAdmin.OK;
    }
}
