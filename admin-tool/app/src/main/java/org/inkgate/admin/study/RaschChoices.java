package org.inkgate.admin.study;

import java.util.List;
import org.inkgate.analysis.mfrm.MfrmOptions;
import org.inkgate.analysis.mfrm.RatingData;
import org.inkgate.analysis.mfrm.ScaleStructure;
import org.inkgate.analysis.mfrm.StudyRatings;
import org.inkgate.analysis.mfrm.bias.BiasEstimation;

/**
 * The many-facet Rasch choices as a test owner writes them (the command's --mfrm-* values, the
 * window's fields) turned into {@link MfrmOptions}; one reading for both, one set of messages.
 */
public final class RaschChoices {

    public static final String RATING_SCALE = "rating-scale";
    public static final String PARTIAL_CREDIT = "partial-credit:";

    private RaschChoices() {
    }

    /**
     * @param declaredAttributes candidate attributes usable in bias pairs
     * @throws IllegalArgumentException a value that cannot be used, saying which and what to give
     */
    public static MfrmOptions parse(List<String> facets, String structure, List<String> biasPairs,
            String biasEstimation, int maxIterations, List<String> declaredAttributes) {
        List<String> chosen = facets.stream().map(String::trim).toList();
        for (String f : chosen) {
            if (declaredAttributes.contains(f)) {
                throw new IllegalArgumentException("--mfrm-facets: '" + f + "' is a candidate attribute,"
                        + " not a facet (each candidate has one value); use it in --mfrm-bias, e.g. condition:" + f);
            }
            if (!StudyRatings.COLUMNS.contains(f)) {
                throw new IllegalArgumentException("--mfrm-facets: '" + f + "' is not a ratings column;"
                        + " use some of " + StudyRatings.COLUMNS + " (candidate is always modelled)");
            }
        }
        MfrmOptions.Builder b = MfrmOptions.builder(chosen).structure(structure(structure)).maxIterations(maxIterations);
        for (String pair : biasPairs == null ? List.<String>of() : biasPairs.stream().distinct().toList()) {
            String[] ab = pair.trim().split(":", -1);
            if (ab.length != 2 || !isColumn(ab[0], declaredAttributes) || !isColumn(ab[1], declaredAttributes)) {
                throw new IllegalArgumentException("--mfrm-bias: '" + pair + "' is not COLUMN:COLUMN with columns"
                        + " among candidate, " + StudyRatings.COLUMNS + " and the attributes declared with"
                        + " --attribute or --roster-attribute " + declaredAttributes + " (e.g. rater:task,"
                        + " condition:first_language)");
            }
            b.bias(ab[0], ab[1]);
        }
        b.biasEstimation(BiasEstimation.ofOption(biasEstimation.trim()));
        return b.build();
    }

    private static boolean isColumn(String c, List<String> declaredAttributes) {
        return RatingData.CANDIDATE.equals(c) || StudyRatings.COLUMNS.contains(c) || declaredAttributes.contains(c);
    }

    private static ScaleStructure structure(String text) {
        String t = text.trim();
        if (t.equals(RATING_SCALE)) {
            return new ScaleStructure.RatingScale();
        }
        if (t.startsWith(PARTIAL_CREDIT) && t.length() > PARTIAL_CREDIT.length()) {
            return new ScaleStructure.PartialCredit(t.substring(PARTIAL_CREDIT.length()));
        }
        throw new IllegalArgumentException("--mfrm-structure: '" + text + "'; use rating-scale or"
                + " partial-credit:FACET (e.g. partial-credit:task)");
    }
}
