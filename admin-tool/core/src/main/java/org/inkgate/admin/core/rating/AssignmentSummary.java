package org.inkgate.admin.core.rating;

import java.util.ArrayList;
import java.util.List;

/**
 * What an assignment run did, for people: the seed, the workloads, whether the raters are linked,
 * and any warning; the same lines in {@code rate assign} and the admin window.
 */
public final class AssignmentSummary {

    private AssignmentSummary() {
    }

    public static List<String> lines(AssignmentRuns.AssignmentOutcome o) {
        RatingAssigner.Plan plan = o.plan();
        int k = plan.ratersPerResponse();
        List<String> out = new ArrayList<>();
        out.add("Assigned " + plan.placements().size() / k + " responses to " + k + " rater(s) each, seed "
                + plan.seed() + " (recorded; the same seed and responses give the same design). Workloads:");
        plan.workload().entrySet().stream().sorted(java.util.Map.Entry.comparingByKey())
                .forEach(e -> out.add("  " + e.getKey() + "  " + e.getValue()));
        out.add(linkage(o.wholeDesign()));
        plan.warnings().forEach(w -> out.add("WARNING: " + w));
        return out;
    }

    /** Whether every rater shares responses with every other, directly or through others. */
    public static String linkage(RaterLinks.Report design) {
        return design.connected() ? "Rater links: connected (every rater shares responses, directly or through others)."
                : "Rater links: NOT connected; groups " + design.components();
    }
}
