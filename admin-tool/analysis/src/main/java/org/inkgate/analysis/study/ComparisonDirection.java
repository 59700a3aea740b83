package org.inkgate.analysis.study;

import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.inkgate.analysis.data.Rating;
import org.inkgate.analysis.data.ToolUse;

/**
 * Which condition the paired comparison subtracts from which, and why. By default the difference
 * is with resources minus without: the condition under which the tool-use table shows tools
 * offered is "with resources". A baseline given by the user wins; when the input cannot say which
 * condition had resources (no tool-use table, or tools under both or neither), the first condition
 * in alphabetical order is the baseline and the report says so.
 *
 * @param baseline the condition subtracted (null: let the sections' own order stand)
 * @param reason   one sentence for the report on how the direction was chosen
 */
record ComparisonDirection(String baseline, String reason) {

    static ComparisonDirection of(List<String> conditions, List<Rating> ratings, List<ToolUse> toolUse,
            String userBaseline) {
        if (userBaseline != null) {
            return new ComparisonDirection(userBaseline, "Direction: chosen with --baseline ('" + userBaseline
                    + "' is subtracted).");
        }
        if (conditions.size() == 2 && !toolUse.isEmpty()) {
            Set<String> offered = new HashSet<>();
            toolUse.forEach(u -> offered.add(u.candidate() + '\u0000' + u.task()));
            Set<String> withTools = new HashSet<>();
            for (Rating r : ratings) {
                if (offered.contains(r.candidate() + '\u0000' + r.task())) {
                    withTools.add(r.condition());
                }
            }
            if (withTools.size() == 1) {
                String with = withTools.iterator().next();
                String without = conditions.get(0).equals(with) ? conditions.get(1) : conditions.get(0);
                return new ComparisonDirection(without, "Direction: with resources minus without ('" + with
                        + "' minus '" + without + "'), the default: the tool-use table shows tools offered under '"
                        + with + "' only. --baseline changes it.");
            }
        }
        String why = toolUse.isEmpty() ? "without a tool-use table the report cannot tell which condition offered"
                + " resources" : "the tool-use table shows tools offered under both conditions or neither";
        return new ComparisonDirection(null, "Direction: " + why + ", so the first condition in alphabetical order"
                + " is subtracted; pass --baseline with the condition without resources to read the difference as"
                + " with resources minus without.");
    }
}
