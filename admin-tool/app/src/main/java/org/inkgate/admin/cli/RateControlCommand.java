package org.inkgate.admin.cli;

import java.io.PrintWriter;
import java.security.SecureRandom;
import java.util.List;
import java.util.Locale;
import org.inkgate.admin.core.rating.ControlMonitor;
import org.inkgate.admin.core.rating.ControlScripts;
import org.inkgate.admin.core.rating.RatingException;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.format.refusal.FormatRefusal;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code rate control ...} and {@code rate monitor}: control scripts with agreed scores, and each rater against them. */
@Command(name = "control", mixinStandardHelpOptions = true,
        description = "Control scripts: responses with agreed scores (e.g. from a standardisation meeting), mixed"
                + " into raters' queues unannounced; their ratings never enter candidates' scores.",
        subcommands = {RateControlCommand.Mark.class, RateControlCommand.Mix.class, RateControlCommand.ListControls.class})
final class RateControlCommand extends GroupCommand {

    @Command(name = "mark", mixinStandardHelpOptions = true,
            description = "Mark a candidate's response to a task as a control script with its agreed scores.")
    static final class Mark extends RateCommand.Step {
        @Mixin
        AgreedScriptOptions script;

        @Override
        int run(RatingStore s, PrintWriter out) throws RatingException {
            s.markControl(script.candidate, script.task, script.scores(spec), script.source);
            out.println("Marked: candidate " + script.candidate + ", task " + script.task
                    + ". Put it into the queues with rate control mix.");
            return InkgateAdmin.OK;
        }
    }

    @Command(name = "mix", mixinStandardHelpOptions = true,
            description = "Put every control script into every rater's queue that does not hold it yet, at seeded"
                    + " random places among the unrated items.")
    static final class Mix extends RateCommand.Step {
        @Option(names = "--seed", paramLabel = "N", description = "seed of the places (default: a new one, printed)")
        Long seed;

        @Override
        int run(RatingStore s, PrintWriter out) throws RatingException {
            long used = seed != null ? seed : new SecureRandom().nextLong();
            int added = s.mixControls(used);
            out.println(added + " control item(s) added to raters' queues (seed " + used + ").");
            return InkgateAdmin.OK;
        }
    }

    @Command(name = "list", mixinStandardHelpOptions = true, description = "List the control scripts.")
    static final class ListControls extends RateCommand.Step {
        @Override
        int run(RatingStore s, PrintWriter out) throws RatingException {
            List<ControlScripts.Control> list = s.controls();
            out.println(list.size() + " control script(s):");
            for (ControlScripts.Control c : list) {
                out.println("  candidate " + c.candidateNumber() + "  task " + c.taskId() + "  agreed "
                        + new java.util.TreeMap<>(c.agreed()) + "  in " + c.inQueues() + " queue(s), rated "
                        + c.rated() + "  source: " + FormatRefusal.printable(c.source()));
            }
            return InkgateAdmin.OK;
        }
    }

    @Command(name = "monitor", mixinStandardHelpOptions = true,
            description = {"Each rater against the control scripts' agreed scores: exact and adjacent agreement, mean"
                    + " difference and drift over the rating period; a rater outside a limit is flagged (exit code 3).",
                "The default limits are placeholders: set your own standard."})
    static final class Monitor extends RateCommand.Step {
        @Option(names = "--min-exact", paramLabel = "SHARE", description = "flag below this exact agreement (0-1)")
        Double minExact;

        @Option(names = "--min-adjacent", paramLabel = "SHARE", defaultValue = "" + ControlMonitor.Thresholds.PLACEHOLDER_MIN_ADJACENT,
                description = "flag below this adjacent agreement (0-1; default ${DEFAULT-VALUE})")
        Double minAdjacent;

        @Option(names = "--max-mean-difference", paramLabel = "POINTS",
                defaultValue = "" + ControlMonitor.Thresholds.PLACEHOLDER_MAX_MEAN_DIFFERENCE,
                description = "flag a mean difference beyond +- this (default ${DEFAULT-VALUE})")
        Double maxMean;

        @Option(names = "--max-drift", paramLabel = "POINTS",
                defaultValue = "" + ControlMonitor.Thresholds.PLACEHOLDER_MAX_DRIFT,
                description = "flag a drift beyond +- this (default ${DEFAULT-VALUE})")
        Double maxDrift;

        @Override
        int run(RatingStore s, PrintWriter out) throws RatingException {
            List<ControlMonitor.RaterReport> reports = ControlMonitor.of(s.controlRatings(),
                    new ControlMonitor.Thresholds(minExact, minAdjacent, maxMean, maxDrift));
            out.println("Raters against the control scripts (score - agreed; drift: later half minus earlier half):");
            out.println(String.format(Locale.ROOT, "  %-12s %7s %6s %6s %8s %9s %7s", "rater", "scripts", "pairs",
                    "exact", "adjacent", "mean diff", "drift"));
            boolean any = false;
            for (ControlMonitor.RaterReport r : reports) {
                out.println(String.format(Locale.ROOT, "  %-12s %7d %6d %6.2f %8.2f %+9.2f %7s%s", r.raterId(),
                        r.scripts(), r.pairs(), r.exact(), r.adjacent(), r.meanDifference(),
                        Double.isNaN(r.drift()) ? "-" : String.format(Locale.ROOT, "%+.2f", r.drift()),
                        r.flagged() ? "  FLAGGED: " + String.join("; ", r.flags()) : ""));
                any |= r.flagged();
            }
            if (reports.isEmpty()) {
                out.println("  no control script rated yet");
            }
            if (any) {
                out.println("A flag asks the test owner to look (retraining, re-rating); what follows is for your rules.");
            }
            return any ? InkgateAdmin.ATTENTION : InkgateAdmin.OK;
        }
    }
}
