package org.inkgate.analysis.data;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

/**
 * The design the ratings have, read from each candidate's set of conditions: every candidate under
 * every condition is a within-candidate design, every candidate under exactly one a parallel-groups
 * (between-candidates) design, anything else a design the data do not fit. A design declared by the
 * user is checked against it; the analyses follow {@link #analysed()}, never a declaration the data
 * contradict.
 *
 * @param found     the structure of the data
 * @param declared  the design the user declared (null: none)
 * @param conditions the conditions in alphabetical order
 * @param perCondition candidates under each condition
 * @param misfits   candidates that break the structure (UNFIT) or the declaration (mismatch), sorted
 * @param reason    one or two sentences for the report: what was found and why the analyses follow
 */
public record StudyDesign(Kind found, Kind declared, List<String> conditions, Map<String, Integer> perCondition,
        List<String> misfits, String reason) {

    /** Kinds of design. */
    public enum Kind {
        /** Every candidate under every condition. */
        WITHIN,
        /** Every candidate under exactly one condition. */
        PARALLEL,
        /** One condition only: nothing to compare. */
        SINGLE_CONDITION,
        /** Neither: some candidates under several but not all conditions, or a mixture. */
        UNFIT;

        /** The word the report and the command line use. */
        public String word() {
            return switch (this) {
                case WITHIN -> "within";
                case PARALLEL -> "parallel";
                case SINGLE_CONDITION -> "single condition";
                case UNFIT -> "not fitting";
            };
        }
    }

    public StudyDesign {
        conditions = List.copyOf(conditions);
        perCondition = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(perCondition));
        misfits = List.copyOf(misfits);
    }

    /** The designs a user can declare, by their command-line word. */
    public static Kind parseDeclared(String word) {
        return switch (word.trim().toLowerCase(Locale.ROOT)) {
            case "within" -> Kind.WITHIN;
            case "parallel" -> Kind.PARALLEL;
            default -> throw new IllegalArgumentException("unknown design '" + word + "': give within (every"
                    + " candidate under every condition) or parallel (every candidate under exactly one)");
        };
    }

    /** The design to analyse: the data's own when they fit one and agree with any declaration, else UNFIT. */
    public Kind analysed() {
        if (found == Kind.UNFIT || found == Kind.SINGLE_CONDITION) {
            return found;
        }
        return declared == null || declared == found ? found : Kind.UNFIT;
    }

    /** True when the user declared a design the data do not have. */
    public boolean mismatch() {
        return declared != null && declared != found;
    }

    /** Reads the design from the ratings, with an optional declaration (null: none). */
    public static StudyDesign of(List<Rating> ratings, Kind declared) {
        Map<String, Set<String>> byCandidate = new LinkedHashMap<>();
        Set<String> all = new TreeSet<>();
        for (Rating r : ratings) {
            byCandidate.computeIfAbsent(r.candidate(), k -> new TreeSet<>()).add(r.condition());
            all.add(r.condition());
        }
        Map<String, Integer> perCondition = new LinkedHashMap<>();
        all.forEach(c -> perCondition.put(c, 0));
        byCandidate.values().forEach(s -> s.forEach(c -> perCondition.merge(c, 1, Integer::sum)));
        int k = all.size();
        List<String> conditions = List.copyOf(all);
        int n = byCandidate.size();
        if (k < 2) {
            return new StudyDesign(Kind.SINGLE_CONDITION, declared, conditions, perCondition, List.of(),
                    "The ratings hold " + (k == 0 ? "no condition" : "one condition ('" + conditions.get(0) + "')")
                            + ": there is nothing to compare.");
        }
        List<String> underAll = new ArrayList<>(), underOne = new ArrayList<>(), underSome = new ArrayList<>();
        byCandidate.forEach((c, s) -> (s.size() == k ? underAll : s.size() == 1 ? underOne : underSome).add(c));
        Kind found;
        List<String> misfits;
        String what;
        if (underAll.size() == n) {
            found = Kind.WITHIN;
            misfits = declared == Kind.PARALLEL ? sorted(underAll) : List.of();
            what = "every one of the " + n + " candidates has scores under all " + k + " conditions";
        } else if (underOne.size() == n) {
            found = Kind.PARALLEL;
            misfits = List.of();
            what = "each of the " + n + " candidates has scores under exactly one of the " + k + " conditions";
        } else {
            found = Kind.UNFIT;
            // the candidates that break the commoner pattern are the ones to look at
            List<String> off = new ArrayList<>(underSome);
            off.addAll(underAll.size() >= underOne.size() ? underOne : underAll);
            misfits = sorted(off);
            what = underAll.size() + " candidate(s) have scores under all " + k + " conditions, " + underOne.size()
                    + " under exactly one and " + underSome.size() + " under some but not all";
        }
        String reason;
        if (found == Kind.UNFIT) {
            reason = "The data fit neither a within-candidate nor a parallel-groups design: " + what + ". No"
                    + " condition comparison is made, because either analysis would treat some scores wrongly;"
                    + " check the candidates listed (a candidate rated under the wrong condition, or a missing"
                    + " sitting) and run again.";
        } else if (declared != null && declared != found) {
            reason = "The design was declared " + declared.word() + ", but " + what + ", which is a "
                    + found.word() + " design. No condition comparison is made: correct the declaration, or the"
                    + " ratings if they are the ones in error.";
        } else {
            String design = found == Kind.WITHIN ? "a within-candidate design: conditions are compared within"
                    + " each candidate" : "a parallel-groups design: condition describes the candidates, and the"
                    + " groups are compared as independent samples";
            reason = (declared != null ? "The declared design (" + declared.word() + ") agrees with the data: "
                    : "Design read from the data: ") + what + ", so this is " + design + ".";
        }
        return new StudyDesign(found, declared, conditions, perCondition, misfits, reason);
    }

    private static List<String> sorted(List<String> ids) {
        return ids.stream().sorted().toList();
    }
}
