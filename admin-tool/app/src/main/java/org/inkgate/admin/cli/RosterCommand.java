package org.inkgate.admin.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.Callable;
import org.inkgate.admin.core.roster.RosterCandidate;
import org.inkgate.admin.core.roster.RosterReader;
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
        Map<String, Integer> levels = new TreeMap<>();
        roster.forEach(r -> levels.merge(r.level(), 1, Integer::sum));
        long extra = roster.stream().filter(r -> r.extraTimePercent() > 0).count();
        long large = roster.stream().filter(RosterCandidate::largePrint).count();
        long contrast = roster.stream().filter(RosterCandidate::highContrast).count();
        w.println(file + ": " + roster.size() + " candidates, no problems found.");
        w.println("  per level: " + levels);
        w.println("  accommodations: extra time " + extra + ", large print " + large + ", high contrast " + contrast);
        roster.stream().findFirst().filter(r -> !r.personal().isEmpty()).ifPresent(r -> w.println("  personal fields "
                + r.personal().keySet() + " stay in the results store; they never go into bundles or rater exports."));
        return InkgateAdmin.OK;
    }
}
