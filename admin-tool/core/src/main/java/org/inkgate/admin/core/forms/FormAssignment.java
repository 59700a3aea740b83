package org.inkgate.admin.core.forms;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.inkgate.admin.core.roster.RosterCandidate;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.InvalidSourceException;
import org.inkgate.admin.core.source.Problem;
import org.inkgate.format.bundle.FormSpec;

/**
 * Assigns a roster to an exam's forms by its design (the one step {@code forms --roster} and the
 * admin window's forms step call): within-candidate designs through {@link FormAssigner},
 * parallel designs through {@link ParallelAllocator}; under {@code exactBalance} a roster whose
 * strata cannot be balanced exactly is refused with the sizes that would be.
 */
public final class FormAssignment {

    /** The roster column that holds the first language (a named field of {@link RosterCandidate}). */
    public static final String FIRST_LANGUAGE = "first_language";

    /**
     * An assignment with its balance.
     *
     * @param counts   candidates per level and form, and the within-candidate margins
     * @param balance  the lines to show: the design's own balance counts
     */
    public record Result(Assignment assignment, AssignmentCounts counts, List<String> balance) {
    }

    private FormAssignment() {
    }

    public static Result assign(ExamSource exam, List<FormSpec> forms, List<RosterCandidate> roster, long seed)
            throws InvalidSourceException {
        ExamSource.Design design = exam.design();
        List<ParallelAllocator.Candidate> stratified = strata(design, roster);
        checkExactBalance(exam, forms, stratified);
        if (!design.kind().betweenCandidates()) {
            Assignment a = FormAssigner.assign(roster.stream().map(c -> new FormAssigner.Candidate(c.candidateNumber(),
                    c.level())).toList(), forms, FormDesigner.blockSize(exam), seed);
            AssignmentCounts counts = AssignmentCounts.of(a, forms);
            return new Result(a, counts, counts.lines());
        }
        List<String> conditions = exam.conditions().stream().map(ExamSource.Condition::id).toList();
        Assignment a = ParallelAllocator.assign(stratified, forms, design.allocation(),
                FormDesigner.taskOrders(exam).size(), seed);
        AllocationCounts allocation = AllocationCounts.of(a, stratified, forms, conditions, design.allocation());
        return new Result(a, AssignmentCounts.of(a, forms), allocation.lines(forms));
    }

    /** Each candidate with the level and the values of the attributes the design stratifies by. */
    static List<ParallelAllocator.Candidate> strata(ExamSource.Design design, List<RosterCandidate> roster)
            throws InvalidSourceException {
        List<Problem> problems = new ArrayList<>();
        for (String attribute : design.stratifyBy()) {
            if (!attribute.equals(FIRST_LANGUAGE) && roster.stream().noneMatch(r -> r.personal().containsKey(attribute))) {
                problems.add(new Problem("exam.yaml", 0, 0, "design.stratifyBy", "names the roster column \"" + attribute
                        + "\", which the roster does not have; add the column to the roster or remove it from stratifyBy"));
            }
        }
        if (!problems.isEmpty()) {
            throw new InvalidSourceException("the design's strata cannot be formed", problems);
        }
        List<ParallelAllocator.Candidate> out = new ArrayList<>();
        for (RosterCandidate r : roster) {
            List<String> stratum = new ArrayList<>();
            stratum.add(r.level());
            for (String attribute : design.stratifyBy()) {
                String value = attribute.equals(FIRST_LANGUAGE) ? r.firstLanguage() : r.personal().get(attribute);
                stratum.add(value == null || value.isBlank() ? "(not given)" : value.strip());
            }
            out.add(new ParallelAllocator.Candidate(r.candidateNumber(), stratum));
        }
        return out;
    }

    private static void checkExactBalance(ExamSource exam, List<FormSpec> forms,
            List<ParallelAllocator.Candidate> candidates) throws InvalidSourceException {
        if (!exam.design().exactBalance()) {
            return;
        }
        int cycle = DesignSummary.cycle(exam, forms);
        boolean parallel = exam.design().kind().betweenCandidates();
        Map<String, Integer> sizes = new TreeMap<>();
        candidates.forEach(c -> sizes.merge(String.join(" / ", parallel ? c.stratum() : List.of(c.level())), 1,
                Integer::sum));
        List<Problem> problems = new ArrayList<>();
        sizes.forEach((stratum, n) -> {
            if (n % cycle != 0) {
                int add = cycle - n % cycle;
                int remove = n % cycle;
                problems.add(new Problem("roster", 0, 0, stratum, (parallel ? "stratum " : "level ") + stratum + " has " + n
                        + " candidates; exact balance needs a multiple of " + cycle + " (" + why(exam, forms)
                        + "): add " + add + " or remove " + remove + " candidate" + (remove == 1 ? "" : "s")
                        + ", or set exactBalance: false to balance as nearly as the numbers allow"));
            }
        });
        if (!problems.isEmpty()) {
            throw new InvalidSourceException("the roster cannot be balanced exactly over the "
                    + exam.design().kind().word() + " design", problems);
        }
    }

    private static String why(ExamSource exam, List<FormSpec> forms) {
        int c = exam.conditions().size();
        return switch (exam.design().kind()) {
            case CROSSOVER -> "the Williams design for " + c + " conditions has " + forms.size() + " sequences"
                    + (c % 2 == 1 ? ", two Latin squares as " + c + " is odd" : "");
            case LATIN_SQUARE -> "one candidate per form, " + forms.size() + " forms";
            case PARALLEL -> "blocks of " + exam.design().allocation().stream().mapToInt(Integer::intValue).sum()
                    + " for the ratio " + DesignSummary.ratio(exam.design().allocation()) + " times "
                    + FormDesigner.taskOrders(exam).size() + " task orders";
        };
    }
}
