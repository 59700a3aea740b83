package org.inkgate.admin.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.TreeMap;
import org.inkgate.admin.core.rating.QualificationSet;
import org.inkgate.admin.core.rating.QualificationStanding;
import org.inkgate.admin.core.rating.RatingException;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.format.refusal.FormatRefusal;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code rate qualification ...}: the scripts a rater scores within the test owner's limits before live rating opens. */
@Command(name = "qualification", mixinStandardHelpOptions = true,
        description = {"The qualification set: responses with agreed scores that every rater scores first, openly,"
                + " before live rating opens. Once a rule is set, a rater's live items stay closed until the rater has"
                + " scored the whole set within its limits, or you admit the rater. Qualification ratings never enter"
                + " candidates' scores.",
            "The tool has no default limits: set those your scoring rules give."},
        subcommands = {RateQualificationCommand.Mark.class, RateQualificationCommand.Give.class,
            RateQualificationCommand.Rule.class, RateQualificationCommand.Status.class,
            RateQualificationCommand.Admit.class})
final class RateQualificationCommand extends GroupCommand {

    @Command(name = "mark", mixinStandardHelpOptions = true,
            description = "Mark a candidate's response to a task as a qualification script with its agreed scores.")
    static final class Mark extends RateCommand.Step {
        @Mixin
        AgreedScriptOptions script;

        @Override
        int run(RatingStore s, PrintWriter out) throws RatingException {
            s.markQualification(script.candidate, script.task, script.scores(spec), script.source);
            out.println("Marked as a qualification script: candidate " + script.candidate + ", task " + script.task
                    + ". Give the set to the raters with rate qualification give.");
            return InkgateAdmin.OK;
        }
    }

    @Command(name = "give", mixinStandardHelpOptions = true,
            description = "Put every qualification script at the front of every rater's queue (again after adding"
                    + " raters or scripts).")
    static final class Give extends RateCommand.Step {
        @Override
        int run(RatingStore s, PrintWriter out) throws RatingException {
            int added = s.giveQualificationSet();
            out.println(added + " qualification item(s) given to raters.");
            if (s.qualificationRule().isEmpty()) {
                out.println("No rule is set yet, so live rating stays open: set one with rate qualification rule.");
            }
            return InkgateAdmin.OK;
        }
    }

    @Command(name = "rule", mixinStandardHelpOptions = true,
            description = "Set the limits a rater's qualification ratings must keep (over every criterion score);"
                    + " from then on live rating opens only for raters who pass or are admitted.")
    static final class Rule extends RateCommand.Step {
        @Option(names = "--min-exact", paramLabel = "SHARE", description = "at least this exact agreement (0-1)")
        Double minExact;

        @Option(names = "--min-adjacent", paramLabel = "SHARE",
                description = "at least this adjacent agreement, within 1 point (0-1)")
        Double minAdjacent;

        @Option(names = "--max-mean-difference", paramLabel = "POINTS",
                description = "a mean difference from the agreed scores within +- this")
        Double maxMean;

        @Override
        int run(RatingStore s, PrintWriter out) throws RatingException {
            QualificationSet.Rule rule;
            try {
                rule = new QualificationSet.Rule(minExact, minAdjacent, maxMean);
            } catch (IllegalArgumentException e) {
                throw new RatingException(e.getMessage() + "; nothing was stored");
            }
            s.setQualificationRule(rule);
            out.println("Qualification rule set: " + rule.describe() + ". Live rating is now open only to raters who"
                    + " pass the set or whom you admit.");
            return InkgateAdmin.OK;
        }
    }

    @Command(name = "status", mixinStandardHelpOptions = true,
            description = {"The qualification scripts, and each rater's standing: scripts scored, agreement with the"
                    + " agreed scores, and whether live rating is open.",
                "Exit code 3 while a rater has scored the whole set outside the limits."})
    static final class Status extends RateCommand.Step {
        @Override
        int run(RatingStore s, PrintWriter out) throws RatingException {
            List<QualificationSet.Script> scripts = s.qualificationScripts();
            out.println(scripts.size() + " qualification script(s):");
            for (QualificationSet.Script c : scripts) {
                out.println("  candidate " + FormatRefusal.printable(c.candidateNumber()) + "  task " + c.taskId()
                        + "  agreed " + new TreeMap<>(c.agreed()) + "  given " + c.given() + ", scored " + c.rated()
                        + "  source: " + FormatRefusal.printable(c.source()));
            }
            out.println("Rule: " + s.qualificationRule().map(QualificationSet.Rule::describe)
                    .orElse("none set (live rating open to every rater)"));
            out.println(String.format(Locale.ROOT, "  %-12s %6s %6s %8s %9s  %s", "rater", "scored", "exact",
                    "adjacent", "mean diff", "standing"));
            boolean attention = false;
            for (QualificationStanding q : s.qualificationStandings()) {
                var a = q.agreement();
                out.println(String.format(Locale.ROOT, "  %-12s %6s %6s %8s %9s  %s", q.raterId(),
                        q.rated() + "/" + q.given(), a == null ? "-" : String.format(Locale.ROOT, "%.2f", a.exact()),
                        a == null ? "-" : String.format(Locale.ROOT, "%.2f", a.adjacent()),
                        a == null ? "-" : String.format(Locale.ROOT, "%+.2f", a.meanDifference()),
                        q.status().words() + (q.status() == QualificationStanding.Status.NOT_PASSED
                                ? " (" + String.join("; ", a.flags()) + ")" : "")
                        + (q.admission() != null ? " by " + FormatRefusal.printable(q.admission().by()) + ": "
                                + FormatRefusal.printable(q.admission().reason()) : "")));
                attention |= q.status() == QualificationStanding.Status.NOT_PASSED;
            }
            if (attention) {
                out.println("A rater outside the limits waits for your decision (retraining, a new set, or rate"
                        + " qualification admit); what follows is for your scoring rules.");
            }
            return attention ? InkgateAdmin.ATTENTION : InkgateAdmin.OK;
        }
    }

    @Command(name = "admit", mixinStandardHelpOptions = true,
            description = "Open live rating for a rater whatever the set showed, with who decided and why (kept in"
                    + " the store).")
    static final class Admit extends RateCommand.Step {
        @Option(names = "--rater", required = true, paramLabel = "ID", description = "the rater")
        String rater;

        @Option(names = "--by", required = true, paramLabel = "NAME", description = "who decides")
        String by;

        @Option(names = "--reason", required = true, paramLabel = "TEXT", description = "why")
        String reason;

        @Override
        int run(RatingStore s, PrintWriter out) throws RatingException {
            s.admitRater(rater, by, reason);
            out.println("Rater " + rater + " admitted to live rating.");
            return InkgateAdmin.OK;
        }
    }
}
