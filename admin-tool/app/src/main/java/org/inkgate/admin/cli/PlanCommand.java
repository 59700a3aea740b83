package org.inkgate.admin.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.inkgate.analysis.planning.DecisionStudy;
import org.inkgate.analysis.planning.Effects;
import org.inkgate.analysis.planning.PairedDesign;
import org.inkgate.analysis.planning.PowerDesign;
import org.inkgate.analysis.planning.RepeatedMeasuresDesign;
import org.inkgate.analysis.planning.SampleSize;
import org.inkgate.analysis.planning.Sides;
import org.inkgate.analysis.planning.TwoGroupsDesign;
import org.inkgate.analysis.planning.VarianceComponents;
import picocli.CommandLine;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code plan ...}: the size of a study before it is run (power and candidates needed for the
 * paired, two-group and repeated-measures designs) and how a candidate's score reliability changes
 * with the number of raters and tasks (a D study over a pilot's variance components). Parsing and
 * printing only; the computation is {@code org.inkgate.analysis.planning}.
 */
@Command(name = "plan", mixinStandardHelpOptions = true,
        description = "Plan a study: candidates needed (or power) for a design, and score reliability for numbers of"
                + " raters and tasks. Planning figures, not guarantees: they hold only for the effect assumed.",
        subcommands = {PlanCommand.Paired.class, PlanCommand.Groups.class, PlanCommand.Conditions.class,
            PlanCommand.Reliability.class, CommandLine.HelpCommand.class})
final class PlanCommand extends GroupCommand {

    static final List<String> CAVEAT = List.of(
            "These are planning figures, not promises. They hold only if the effect (and, for within-candidate",
            "designs, the correlation) assumed here is close to the truth, which nobody knows before the study:",
            "a smaller effect or a lower correlation needs more candidates. Allow for candidates who will be absent",
            "or whose responses go missing. The study's size, and what counts as a worthwhile effect, are for the",
            "test owner's regulations and the people who approve the study to decide.");

    /** The target: power wanted (then the candidates needed are found) or candidates available (then their power). */
    static final class Target {
        @Option(names = "--power", paramLabel = "P", description = "the power wanted, e.g. 0.8: prints the candidates needed")
        Double power;

        @Option(names = "--candidates", paramLabel = "N",
                description = "the candidates available: prints the power (for two groups, the first group's size)")
        Integer candidates;
    }

    /** Options every power plan shares. */
    static final class Common {
        @ArgGroup(exclusive = true, multiplicity = "1")
        Target target;

        @Option(names = "--alpha", paramLabel = "A", defaultValue = "0.05",
                description = "significance level of the test (default: ${DEFAULT-VALUE})")
        double alpha;
    }

    /** A standardized effect stated directly, or as a Rasch logit difference over the candidates' spread in logits. */
    static final class Effect {
        @Option(names = "--effect", paramLabel = "D",
                description = "the effect to detect: mean difference / standard deviation of scores in one condition (Cohen's d)")
        Double d;

        @Option(names = "--logit-difference", paramLabel = "L",
                description = "the effect as a difference in Rasch logits (needs --candidate-sd-logits)")
        Double logits;

        @Option(names = "--candidate-sd-logits", paramLabel = "S",
                description = "standard deviation of candidate measures in logits, e.g. from a pilot's Rasch analysis")
        Double sdLogits;

        /** d, and a line saying where it came from. */
        Stated resolve(CommandSpec spec) {
            if (d != null && (logits != null || sdLogits != null)) {
                throw new CommandLine.ParameterException(spec.commandLine(),
                        "give the effect once: --effect, or --logit-difference with --candidate-sd-logits");
            }
            if (d != null) {
                return new Stated(d, "d = " + fmt(d));
            }
            if (logits == null || sdLogits == null) {
                throw new CommandLine.ParameterException(spec.commandLine(), "the effect is missing: give --effect D, or"
                        + " --logit-difference L with --candidate-sd-logits S");
            }
            double converted = Effects.fromLogits(logits, sdLogits);
            return new Stated(converted, "d = " + fmt3(converted) + " (" + fmt(logits) + " logits / candidate standard"
                    + " deviation " + fmt(sdLogits) + " logits)");
        }
    }

    record Stated(double value, String line) {
    }

    /** Common printing and the search for the candidates needed. */
    abstract static class PowerPlan implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        @Mixin
        Common common;

        /** The candidates-to-text for this design (e.g. "64 + 64 = 128"). */
        String count(int n) {
            return Integer.toString(n);
        }

        int print(PowerDesign design, List<String> heading, String method) {
            PrintWriter out = spec.commandLine().getOut();
            heading.forEach(out::println);
            int n;
            if (common.target.power != null) {
                n = SampleSize.smallest(design, common.target.power);
                out.println("  Candidates needed for power " + fmt(common.target.power) + ": " + count(n));
                // four decimals here: at three, a power just short of the target would print as the target
                out.println("    power with " + count(n) + ": " + fmt4(design.power(n))
                        + (n > design.fewestCandidates() ? "; with " + count(n - 1) + ": " + fmt4(design.power(n - 1)) : ""));
            } else {
                n = common.target.candidates;
                if (n < design.fewestCandidates()) {
                    throw new IllegalArgumentException("--candidates " + n + " is too few for this test: at least "
                            + design.fewestCandidates());
                }
                out.println("  Power with " + count(n) + " candidates: " + fmt3(design.power(n)));
            }
            out.println("  Power for other numbers of candidates:");
            out.println(String.format(Locale.ROOT, "    %-24s %s", "candidates", "power"));
            for (int m : neighbours(n, design.fewestCandidates())) {
                out.println(String.format(Locale.ROOT, "    %-24s %s", count(m), fmt3(design.power(m))));
            }
            wrapped(out, "  Method: " + method);
            out.println();
            CAVEAT.forEach(out::println);
            return InkgateAdmin.OK;
        }

        Sides sides(boolean oneSided) {
            return oneSided ? Sides.ONE_SIDED : Sides.TWO_SIDED;
        }

        String sidesText(boolean oneSided) {
            return (oneSided ? "one-sided" : "two-sided") + ", alpha " + fmt(common.alpha);
        }
    }

    /** Half, three quarters, the figure itself, one and a quarter, one and a half and twice it. */
    static int[] neighbours(int n, int fewest) {
        return java.util.stream.IntStream.of(n / 2, n * 3 / 4, n, n * 5 / 4, n * 3 / 2, n * 2)
                .map(m -> Math.max(m, fewest)).distinct().toArray();
    }

    @Command(name = "paired", mixinStandardHelpOptions = true,
            description = "Every candidate writes under both conditions (crossover): paired t test.")
    static final class Paired extends PowerPlan {
        @Mixin
        Effect effect;

        @Option(names = "--effect-of-differences", paramLabel = "DZ",
                description = "the effect as mean difference / standard deviation of the differences (d_z), instead of"
                        + " --effect with --correlation")
        Double dz;

        @Option(names = "--correlation", paramLabel = "R",
                description = "correlation between a candidate's scores under the two conditions (needed with --effect"
                        + " or --logit-difference)")
        Double correlation;

        @Option(names = "--one-sided", description = "test in the direction of the effect only")
        boolean oneSided;

        @Override
        public Integer call() {
            String effectLine;
            double ofDifferences;
            if (dz != null) {
                if (effect.d != null || effect.logits != null || correlation != null) {
                    throw new CommandLine.ParameterException(spec.commandLine(), "--effect-of-differences already"
                            + " includes the correlation: give it alone, or --effect with --correlation");
                }
                ofDifferences = dz;
                effectLine = "d_z = " + fmt(dz) + " (mean difference / standard deviation of the differences)";
            } else {
                Stated stated = effect.resolve(spec);
                if (correlation == null) {
                    throw new CommandLine.ParameterException(spec.commandLine(), "--correlation is missing: the paired"
                            + " design's power depends on how closely a candidate's two scores agree (e.g. from a pilot)");
                }
                ofDifferences = Effects.ofDifferences(stated.value(), correlation);
                effectLine = stated.line() + " with correlation " + fmt(correlation) + ": d_z = d / sqrt(2 (1 - r)) = "
                        + fmt3(ofDifferences);
            }
            var design = new PairedDesign(ofDifferences, common.alpha, sides(oneSided));
            return print(design, List.of("Plan: every candidate writes under both conditions; paired t test ("
                    + sidesText(oneSided) + ")", "  Effect: " + effectLine),
                    "noncentral t with n - 1 degrees of freedom and noncentrality d_z sqrt(n) (Lenth's algorithm AS 243);"
                    + (oneSided ? "" : " two-sided power counts both tails."));
        }
    }

    @Command(name = "groups", mixinStandardHelpOptions = true,
            description = "Parallel groups: each candidate writes under one condition; two-group t test.")
    static final class Groups extends PowerPlan {
        @Mixin
        Effect effect;

        @Option(names = "--ratio", paramLabel = "R", defaultValue = "1",
                description = "allocation ratio, second group / first group (default: ${DEFAULT-VALUE}, equal groups)")
        double ratio;

        @Option(names = "--one-sided", description = "test in the direction of the effect only")
        boolean oneSided;

        private TwoGroupsDesign design;

        @Override
        String count(int n1) {
            int n2 = design.secondGroup(n1);
            return n1 + " + " + n2 + " = " + (n1 + n2);
        }

        @Override
        public Integer call() {
            Stated stated = effect.resolve(spec);
            design = new TwoGroupsDesign(stated.value(), common.alpha, sides(oneSided), ratio);
            return print(design, List.of("Plan: two parallel groups, each candidate under one condition; Student's t test ("
                    + sidesText(oneSided) + "), allocation 1 : " + fmt(ratio),
                    "  Effect: " + stated.line() + "; standard deviation pooled within groups",
                    "  Candidates are counted as first group + second group = total."),
                    "noncentral t with n1 + n2 - 2 degrees of freedom and noncentrality d / sqrt(1/n1 + 1/n2) (Lenth's"
                    + " algorithm AS 243); the second group is ratio x n1 rounded up. With equal variances Welch's test"
                    + " has nearly the same power (common practice).");
        }
    }

    @Command(name = "conditions", mixinStandardHelpOptions = true,
            description = "Every candidate writes under each of three or more conditions: repeated-measures ANOVA.")
    static final class Conditions extends PowerPlan {
        @Option(names = "--conditions", required = true, paramLabel = "K", description = "the number of conditions")
        int conditions;

        @Option(names = "--effect-f", paramLabel = "F",
                description = "the effect as Cohen's f: standard deviation of the condition means / standard deviation"
                        + " of scores in one condition (not an f from a pilot's partial eta squared, which divides by"
                        + " the candidate x condition error instead)")
        Double f;

        @Option(names = "--means", paramLabel = "M", split = ",",
                description = "instead of --effect-f: the condition means planned, e.g. 50,53,55 (needs --sd)")
        double[] means;

        @Option(names = "--sd", paramLabel = "S", description = "standard deviation of scores in one condition (with --means)")
        Double sd;

        @Option(names = "--correlation", required = true, paramLabel = "R",
                description = "correlation between a candidate's scores under two conditions (assumed the same for every pair)")
        double correlation;

        @Option(names = "--epsilon", paramLabel = "E", defaultValue = "1",
                description = "sphericity epsilon, 1/(K-1) to 1 (default: ${DEFAULT-VALUE}, sphericity holds)")
        double epsilon;

        @Override
        public Integer call() {
            String effectLine;
            double effectF;
            if (f != null) {
                if (means != null || sd != null) {
                    throw new CommandLine.ParameterException(spec.commandLine(), "give the effect once: --effect-f, or"
                            + " --means with --sd");
                }
                effectF = f;
                effectLine = "f = " + fmt(f);
            } else {
                if (means == null || sd == null) {
                    throw new CommandLine.ParameterException(spec.commandLine(), "the effect is missing: give --effect-f F,"
                            + " or --means M1,M2,... with --sd S");
                }
                if (means.length != conditions) {
                    throw new CommandLine.ParameterException(spec.commandLine(), "--means has " + means.length
                            + " values but --conditions is " + conditions + ": give one mean per condition");
                }
                effectF = Effects.cohensF(means, sd);
                effectLine = "f = " + fmt3(effectF) + " (means " + joined(means) + ", standard deviation " + fmt(sd) + ")";
            }
            var design = new RepeatedMeasuresDesign(conditions, effectF, correlation, epsilon, common.alpha);
            return print(design, List.of("Plan: every candidate writes under each of " + conditions
                    + " conditions; one-way repeated-measures ANOVA (alpha " + fmt(common.alpha) + ")",
                    "  Effect: " + effectLine + "; correlation " + fmt(correlation) + "; sphericity epsilon " + fmt(epsilon)),
                    "noncentral F with (K - 1) e and (n - 1)(K - 1) e degrees of freedom and noncentrality"
                    + " n K f^2 e / (1 - r), e the sphericity epsilon (equal variances and correlations; as Faul, Erdfelder, Lang & Buchner 2007"
                    + " compute it for within-candidate factors). It plans the overall test, not the pairwise comparisons.");
        }
    }

    @Command(name = "reliability", mixinStandardHelpOptions = true,
            description = {"A D study: from a pilot's variance components (candidates, raters and tasks fully crossed),"
                    + " the generalizability coefficient and dependability index of a candidate's score for numbers of"
                    + " raters and tasks."})
    static final class Reliability implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        @Option(names = "--candidate", required = true, paramLabel = "V", description = "candidate variance component")
        double candidate;

        @Option(names = "--rater", required = true, paramLabel = "V", description = "rater variance component")
        double rater;

        @Option(names = "--task", required = true, paramLabel = "V", description = "task variance component")
        double task;

        @Option(names = "--candidate-rater", required = true, paramLabel = "V", description = "candidate x rater component")
        double candidateRater;

        @Option(names = "--candidate-task", required = true, paramLabel = "V", description = "candidate x task component")
        double candidateTask;

        @Option(names = "--rater-task", required = true, paramLabel = "V", description = "rater x task component")
        double raterTask;

        @Option(names = "--residual", required = true, paramLabel = "V",
                description = "residual (candidate x rater x task and error) component")
        double residual;

        @Option(names = "--raters", paramLabel = "N", split = ",", defaultValue = "1,2,3",
                description = "numbers of raters per response to tabulate (default: ${DEFAULT-VALUE})")
        int[] raters;

        @Option(names = "--tasks", paramLabel = "N", split = ",", defaultValue = "1,2,3",
                description = "numbers of tasks per candidate to tabulate (default: ${DEFAULT-VALUE})")
        int[] tasks;

        @Override
        public Integer call() {
            var v = new VarianceComponents(candidate, rater, task, candidateRater, candidateTask, raterTask, residual);
            List<DecisionStudy> table = DecisionStudy.table(v, raters, tasks);
            PrintWriter out = spec.commandLine().getOut();
            out.println("Plan: reliability of a candidate's score (mean over raters and tasks); candidates, raters and tasks"
                    + " fully crossed");
            out.println("  Pilot variance components: candidate " + fmt(candidate) + ", rater " + fmt(rater) + ", task "
                    + fmt(task) + ", candidate x rater " + fmt(candidateRater) + ", candidate x task " + fmt(candidateTask)
                    + ", rater x task " + fmt(raterTask) + ", residual " + fmt(residual));
            out.println(String.format(Locale.ROOT, "  %6s %6s %15s %15s %17s %14s", "raters", "tasks", "relative error",
                    "absolute error", "generalizability", "dependability"));
            for (DecisionStudy d : table) {
                out.println(String.format(Locale.ROOT, "  %6d %6d %15.4f %15.4f %17.3f %14.3f", d.raters(), d.tasks(),
                        d.relativeError(), d.absoluteError(), d.generalizability(), d.dependability()));
            }
            out.println("  Generalizability coefficient: for ranking candidates (relative error). Dependability index: for");
            out.println("  scores read against a fixed standard such as a pass mark (absolute error, also counting rater");
            out.println("  and task difficulty). Method: Brennan (2001), Generalizability Theory, section 4.1.");
            out.println();
            out.println("These are planning figures, not promises. They assume the pilot's components hold for the real");
            out.println("study (a small pilot estimates them roughly), and that every rater scores every response to every");
            out.println("task: when each response gets different raters, the rater component joins the relative error and");
            out.println("the generalizability coefficient is lower. How reliable a score must be is for the test owner's");
            out.println("regulations to decide.");
            return InkgateAdmin.OK;
        }
    }

    /** Prints text in lines of at most 100 characters, continuation lines indented under the first word. */
    static void wrapped(PrintWriter out, String text) {
        final int width = 100;
        String lead = text.substring(0, text.length() - text.stripLeading().length());
        String indent = lead + "    ";
        StringBuilder line = new StringBuilder(lead);
        boolean empty = true;
        for (String word : text.strip().split(" +")) {
            if (!empty && line.length() + 1 + word.length() > width) {
                out.println(line);
                line = new StringBuilder(indent);
                empty = true;
            }
            line.append(empty ? "" : " ").append(word);
            empty = false;
        }
        out.println(line);
    }

    static String fmt(double x) {
        return java.math.BigDecimal.valueOf(x).stripTrailingZeros().toPlainString();
    }

    static String fmt4(double x) {
        return String.format(Locale.ROOT, "%.4f", x);
    }

    static String fmt3(double x) {
        return String.format(Locale.ROOT, "%.3f", x);
    }

    private static String joined(double[] xs) {
        return java.util.Arrays.stream(xs).mapToObj(PlanCommand::fmt).collect(java.util.stream.Collectors.joining(", "));
    }
}
