package org.inkgate.admin.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.security.SecureRandom;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.inkgate.admin.core.rating.AssignmentSummary;
import org.inkgate.admin.core.rating.DiscrepancyRule;
import org.inkgate.admin.core.rating.RatingException;
import org.inkgate.admin.core.rating.RatingFiles;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.core.rating.Referrals;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;
import org.inkgate.format.refusal.FormatRefusal;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code rate}: blind double rating over the results store: raters, the seeded assignment, progress,
 * offline rating sheets, the discrepancy rule and adjudication queue, resolution entries, and the
 * exports the analysis reads. Exit codes: 0 done, 1 refused (the message says what and how to fix;
 * nothing was changed), 2 usage error, 3 done but needs attention (an unlinked design, flags not
 * yet settled, responses still pending).
 */
@Command(name = "rate", mixinStandardHelpOptions = true,
        description = "Blind double rating: add raters, assign responses, follow progress, exchange rating sheets,"
                + " settle disagreements and export ratings and final scores.",
        subcommands = {RateCommand.Raters.class, RateCommand.Assign.class, RateCommand.Progress.class,
            RateCommand.Sheet.class, RateCommand.Rule.class, RateCommand.Flags.class, RateCommand.Resolve.class,
            RateCommand.Export.class, RateCommand.Refer.class, RateCommand.ReferralsGroup.class,
            RateControlCommand.class, RateControlCommand.Monitor.class, RateQualificationCommand.class, DeskCommand.class,
            CommandLine.HelpCommand.class})
final class RateCommand extends GroupCommand {

    /** --store and --exam, shared by every rating step. */
    static final class StoreOptions {
        @Option(names = "--store", required = true, paramLabel = "DB", description = "the results store (from collect)",
                converter = StoreLocationConverter.class)
        StoreLocation store;

        @Option(names = "--store-password-file", paramLabel = "FILE", description = StorePasswordFile.DESCRIPTION)
        java.nio.file.Path storePasswordFile;

        @Option(names = "--exam", paramLabel = "ID", description = "the exam; may be left out when the store holds one")
        String exam;

        /** The store with its password file, if one was named. */
        StoreLocation location() throws RatingException {
            try {
                return StorePasswordFile.apply(store, storePasswordFile);
            } catch (IllegalArgumentException e) {
                throw new RatingException(e.getMessage());
            }
        }

        RatingStore open() throws RatingException {
            StoreLocation store = location();
            String id = exam;
            if (id == null) {
                List<String> exams = Stores.exams(store);
                if (exams.size() != 1) {
                    throw new RatingException("the store holds " + exams.size() + " exams " + exams + "; name one with --exam");
                }
                id = exams.get(0);
            }
            return Stores.openRating(store, id);
        }
    }

    /** Runs a step and turns a refusal into exit code 1 with its message. */
    abstract static class Step implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        @Mixin
        StoreOptions storeOptions;

        abstract int run(RatingStore s, PrintWriter out) throws RatingException, IOException;

        @Override
        public Integer call() {
            PrintWriter out = spec.commandLine().getOut();
            PrintWriter err = spec.commandLine().getErr();
            try (RatingStore s = storeOptions.open()) {
                int code = run(s, out);
                out.flush();
                return code;
            } catch (RatingException e) {
                err.println("inkgate-admin rate " + spec.name() + ": " + e.getMessage());
                return InkgateAdmin.PROBLEMS;
            } catch (NoSuchFileException e) {
                err.println("inkgate-admin rate " + spec.name() + ": no such file: " + e.getFile());
                return InkgateAdmin.PROBLEMS;
            } catch (IOException e) {
                err.println("inkgate-admin rate " + spec.name() + ": " + e.getMessage());
                return InkgateAdmin.PROBLEMS;
            }
        }
    }

    @Command(name = "raters", mixinStandardHelpOptions = true, description = "Add or list raters.",
            subcommands = {Raters.Add.class, Raters.ListRaters.class})
    static final class Raters extends GroupCommand {

        @Command(name = "add", mixinStandardHelpOptions = true,
                description = "Add a rater (or change the label and capacity of one already added).")
        static final class Add extends Step {
            @Parameters(paramLabel = "ID", description = "the rater's id, e.g. R07 (letters, digits, '.', '_', '-')")
            String id;

            @Option(names = "--label", paramLabel = "NAME", description = "how the rater is shown (default: the id)")
            String label;

            @Option(names = "--capacity", paramLabel = "N",
                    description = "the most responses this rater may take in this exam (default: no limit)")
            Integer capacity;

            @Override
            int run(RatingStore s, PrintWriter out) throws RatingException {
                boolean added = s.addRater(id, label, capacity);
                out.println((added ? "Added rater " : "Updated rater ") + id + (capacity == null ? " (no capacity limit)"
                        : " (capacity " + capacity + ")"));
                return InkgateAdmin.OK;
            }
        }

        @Command(name = "list", mixinStandardHelpOptions = true, description = "List the raters.")
        static final class ListRaters extends Step {
            @Override
            int run(RatingStore s, PrintWriter out) throws RatingException {
                for (RatingStore.RaterEntry r : s.raterEntries()) {
                    out.println(r.id() + "  " + r.label() + (r.capacity() == null ? "" : "  capacity " + r.capacity()));
                }
                return InkgateAdmin.OK;
            }
        }
    }

    @Command(name = "assign", mixinStandardHelpOptions = true,
            description = {"Assign every response not yet assigned to raters: balanced workloads, rotating pairs so"
                + " that all raters are linked, queues grouped by task with no candidate twice in a row, blind ids.",
                "The seed is recorded in the store; the same seed and responses give the same raters and order."})
    static final class Assign extends Step {
        @Option(names = "--raters-per-response", paramLabel = "K", defaultValue = "2",
                description = "1, 2 or 3 (default: ${DEFAULT-VALUE})")
        int k;

        @Option(names = "--seed", paramLabel = "N", description = "seed of the random choices (default: a new one,"
                + " printed and recorded)")
        Long seed;

        @Option(names = "--allow-unlinked", description = "store a design whose raters do not all share responses"
                + " (refused otherwise: a many-facet Rasch analysis could not compare them)")
        boolean allowUnlinked;

        @Override
        int run(RatingStore s, PrintWriter out) throws RatingException {
            long used = seed != null ? seed : new SecureRandom().nextLong();
            RatingStore.AssignmentOutcome o = s.assign(k, used, allowUnlinked);
            AssignmentSummary.lines(o).forEach(out::println);
            boolean linked = o.wholeDesign().connected();
            return linked && o.plan().warnings().isEmpty() ? InkgateAdmin.OK : InkgateAdmin.ATTENTION;
        }
    }

    @Command(name = "progress", mixinStandardHelpOptions = true,
            description = "Per rater and task: assigned, rated, remaining, flagged; then pending responses.")
    static final class Progress extends Step {
        @Override
        int run(RatingStore s, PrintWriter out) throws RatingException {
            out.printf("%-12s %-20s %8s %6s %9s %7s%n", "rater", "task", "assigned", "rated", "remaining", "flagged");
            for (RatingStore.ProgressRow r : s.progressRows()) {
                out.printf("%-12s %-20s %8d %6d %9d %7d%n", r.raterId(), r.taskId(), r.total(), r.rated(), r.remaining(),
                        r.flagged());
            }
            int pending = s.pendingResponses();
            out.println(pending == 0 ? "Every assigned response has a final score." : pending
                    + " response(s) have no final score yet (ratings outstanding or disagreements not settled).");
            if (s.rule().isEmpty()) {
                out.println("No discrepancy rule is set: ratings are averaged without any check (set one with rate rule).");
            }
            return pending == 0 ? InkgateAdmin.OK : InkgateAdmin.ATTENTION;
        }
    }

    @Command(name = "sheet", mixinStandardHelpOptions = true,
            description = "Rating sheets (CSV) for raters who work without the rating desk.",
            subcommands = {Sheet.ExportSheet.class, Sheet.ImportSheet.class})
    static final class Sheet extends GroupCommand {

        @Command(name = "export", mixinStandardHelpOptions = true,
                description = {"Write a rater's queue as a sheet: blind_id, task, one column per criterion, comment;",
                    "beside it, the folder SHEET-scripts with one text file per response (blind id only), the rubric"
                    + " and an index."})
        static final class ExportSheet extends Step {
            @Option(names = "--rater", required = true, paramLabel = "ID", description = "whose queue")
            String rater;

            @Option(names = "--out", required = true, paramLabel = "FILE.csv", description = "the sheet to write")
            Path file;

            @Override
            int run(RatingStore s, PrintWriter out) throws RatingException, IOException {
                RatingFiles.exportSheet(s, rater, file).forEach(out::println);
                return InkgateAdmin.OK;
            }
        }

        @Command(name = "import", mixinStandardHelpOptions = true,
                description = "Read a filled sheet back: every row checked; nothing stored if any row is bad; repeatable.")
        static final class ImportSheet extends Step {
            @Option(names = "--rater", required = true, paramLabel = "ID", description = "whose sheet it is")
            String rater;

            @Parameters(paramLabel = "FILE.csv", description = "the filled sheet")
            Path file;

            @Override
            int run(RatingStore s, PrintWriter out) throws RatingException, IOException {
                out.println(RatingFiles.importSheet(s, rater, file));
                return InkgateAdmin.OK;
            }
        }
    }

    @Command(name = "rule", mixinStandardHelpOptions = true,
            description = {"Set the discrepancy rule and apply it to every completely rated response: flagged"
                + " responses go to a third rater (not one of the first) or wait for a resolution entry.",
                "The thresholds are the test owner's decision; follow your exam's regulations."})
    static final class Rule extends Step {
        @Option(names = "--criterion-gap", paramLabel = "K",
                description = "flag when a criterion's scores lie more than K rubric bands apart")
        Integer criterionGap;

        @Option(names = "--total-gap", paramLabel = "N", description = "flag when totals lie more than N points apart")
        Integer totalGap;

        @Option(names = "--adjudicated-score", paramLabel = "METHOD", defaultValue = "closest-pair-mean",
                description = "closest-pair-mean or adjudicator (default: ${DEFAULT-VALUE})")
        String adjudicated;

        @Override
        int run(RatingStore s, PrintWriter out) throws RatingException {
            DiscrepancyRule rule;
            try {
                rule = new DiscrepancyRule(criterionGap, totalGap, DiscrepancyRule.AdjudicatedScore.of(adjudicated));
            } catch (IllegalArgumentException e) {
                throw new CommandLine.ParameterException(spec.commandLine(), e.getMessage());
            }
            int flagged = s.setRule(rule);
            out.println("Rule set: flag " + rule.describe() + ".");
            out.println(flagged + " response(s) flagged now; see rate flags.");
            return InkgateAdmin.OK;
        }
    }

    @Command(name = "flags", mixinStandardHelpOptions = true,
            description = "The adjudication queue: flagged responses, why, and where each stands (runs the rule again first).")
    static final class Flags extends Step {
        @Override
        int run(RatingStore s, PrintWriter out) throws RatingException {
            int fresh = s.review();
            List<RatingStore.Flag> flags = s.flags();
            if (fresh > 0) {
                out.println(fresh + " new flag(s) raised by this review.");
            }
            out.println(flags.size() + " flagged response(s):");
            int open = 0;
            for (RatingStore.Flag f : flags) {
                out.println("  flag " + f.flagId() + "  task " + f.taskId() + "  raters " + String.join(" ", f.raters())
                        + "  " + f.reason());
                out.println("      " + f.status());
                if (f.finalMethod() == null) {
                    open++;
                }
            }
            return open == 0 ? InkgateAdmin.OK : InkgateAdmin.ATTENTION;
        }
    }

    @Command(name = "refer", mixinStandardHelpOptions = true,
            description = "Refer a script of a rater's queue to the test owner (for a sheet rater; desk raters use"
                    + " the desk's Refer button): the text reveals who wrote it, suggests unallowed help, or is off task.")
    static final class Refer extends Step {
        @Option(names = "--rater", required = true, paramLabel = "ID", description = "who refers it")
        String rater;

        @Option(names = "--id", required = true, paramLabel = "BLIND-ID", description = "the script's blind id")
        String blindId;

        @Option(names = "--reason", required = true, paramLabel = "REASON",
                description = "identity-revealed, unallowed-help, off-task or other")
        String reason;

        @Option(names = "--note", required = true, paramLabel = "TEXT", description = "what the rater saw")
        String note;

        @Override
        int run(RatingStore s, PrintWriter out) throws RatingException {
            long id = s.refer(rater, blindId, Referrals.Reason.of(reason), note);
            out.println("Referral " + id + " recorded for the test owner (rate referrals list).");
            return InkgateAdmin.OK;
        }
    }

    @Command(name = "referrals", mixinStandardHelpOptions = true,
            description = "Scripts raters referred to the test owner: list them and record decisions.",
            subcommands = {ReferralsGroup.ListReferrals.class, ReferralsGroup.Decide.class})
    static final class ReferralsGroup extends GroupCommand {

        @Command(name = "list", mixinStandardHelpOptions = true,
                description = "List referrals with the candidate number (for the test owner only); exit 3 while any is open.")
        static final class ListReferrals extends Step {
            @Option(names = "--open", description = "only those without a decision")
            boolean openOnly;

            @Override
            int run(RatingStore s, PrintWriter out) throws RatingException {
                List<Referrals.Referral> list = s.referrals(openOnly);
                out.println(list.size() + " referral(s):");
                boolean open = false;
                for (Referrals.Referral r : list) {
                    // the note and decision are typed by people: shown with control characters escaped
                    out.println("  referral " + r.id() + "  " + r.blindId() + "  task " + r.taskId() + "  candidate "
                            + r.candidateNumber() + "  by rater " + r.raterId() + "  " + r.referredAt());
                    out.println("      " + r.reason().word() + " (" + r.reason().meaning() + "): "
                            + FormatRefusal.printable(r.note()));
                    out.println("      " + (r.open() ? "OPEN: decide under your regulations (rate referrals decide)"
                            : "decided by " + FormatRefusal.printable(r.decidedBy()) + " " + r.decidedAt() + ": "
                            + FormatRefusal.printable(r.decision())));
                    open |= r.open();
                }
                return open ? InkgateAdmin.ATTENTION : InkgateAdmin.OK;
            }
        }

        @Command(name = "decide", mixinStandardHelpOptions = true,
                description = "Record the test owner's decision on a referral (a later decision replaces it).")
        static final class Decide extends Step {
            @Option(names = "--referral", required = true, paramLabel = "N", description = "the number from the list")
            long referral;

            @Option(names = "--by", required = true, paramLabel = "NAME", description = "who decided")
            String by;

            @Option(names = "--decision", required = true, paramLabel = "TEXT", description = "what was decided")
            String decision;

            @Override
            int run(RatingStore s, PrintWriter out) throws RatingException {
                s.decide(referral, by, decision);
                out.println("Referral " + referral + " decided.");
                return InkgateAdmin.OK;
            }
        }
    }

    @Command(name = "resolve", mixinStandardHelpOptions = true,
            description = "Settle a flagged response by a resolution entry (e.g. agreed in discussion); the raters'"
                    + " ratings are kept beside it.")
    static final class Resolve extends Step {
        @Option(names = "--flag", required = true, paramLabel = "N", description = "the flag number from rate flags")
        long flag;

        @Option(names = "--by", required = true, paramLabel = "NAME", description = "who resolved it")
        String by;

        @Option(names = "--score", required = true, paramLabel = "CRITERION=SCORE", split = ",",
                description = "one per criterion, e.g. --score content=5,language=6")
        List<String> scores;

        @Option(names = "--comment", paramLabel = "TEXT", defaultValue = "", description = "why")
        String comment;

        @Override
        int run(RatingStore s, PrintWriter out) throws RatingException {
            s.resolve(flag, by, scores(spec, scores), comment);
            out.println("Flag " + flag + " settled by resolution entry of " + by + ".");
            return InkgateAdmin.OK;
        }
    }

    /** CRITERION=SCORE pairs as typed after an option, or a usage error naming the bad one. */
    static Map<String, Integer> scores(CommandSpec spec, List<String> scores) {
        {
            // picocli has already split the option's value at commas
            Map<String, Integer> parsed = new LinkedHashMap<>();
            for (String sc : scores) {
                String[] kv = sc.split("=", 2);
                try {
                    if (kv.length != 2 || parsed.put(kv[0].strip(), Integer.parseInt(kv[1].strip())) != null) {
                        throw new NumberFormatException();
                    }
                } catch (NumberFormatException e) {
                    throw new CommandLine.ParameterException(spec.commandLine(), "'" + sc + "': give"
                            + " CRITERION=WHOLE-NUMBER once per criterion, e.g. content=5");
                }
            }
            return parsed;
        }
    }

    @Command(name = "export", mixinStandardHelpOptions = true,
            description = {"Write ratings.csv (one row per rating: candidate,level,form,task,condition,rater,"
                + "criterion,score,kind,rated_at; what analyse reads) and final-scores.csv (method and rule per score).",
                "Both hold candidate numbers: handle them under your data-protection rules."})
    static final class Export extends Step {
        @Option(names = "--out", required = true, paramLabel = "DIR", description = "folder for the two files")
        Path dir;

        @Override
        int run(RatingStore s, PrintWriter out) throws RatingException, IOException {
            RatingFiles.exportScores(s, dir).forEach(out::println);
            if (s.pendingResponses() > 0) {
                return InkgateAdmin.ATTENTION;
            }
            return InkgateAdmin.OK;
        }
    }
}
