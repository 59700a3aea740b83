package org.inkgate.admin.study;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.analysis.data.StudyDesign;
import org.inkgate.analysis.mfrm.AnchorFile;
import org.inkgate.analysis.mfrm.ConditionFacet;
import org.inkgate.analysis.mfrm.FacetPair;
import org.inkgate.analysis.mfrm.ManyFacetRasch;
import org.inkgate.analysis.mfrm.MfrmOptions;
import org.inkgate.analysis.mfrm.MfrmRefusedException;
import org.inkgate.analysis.mfrm.MfrmResult;
import org.inkgate.analysis.mfrm.MfrmSection;
import org.inkgate.analysis.mfrm.RatingData;
import org.inkgate.analysis.mfrm.StudyRatings;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.study.StudyData;

/** The many-facet Rasch part of an {@link AnalysisRun}: a refusal becomes the section's text. */
final class RaschRun {

    /** The Rasch section, its result (null when refused) and the anchors that did not apply. */
    record Outcome(Section section, MfrmResult result, List<String> leftOut) {
    }

    private RaschRun() {
    }

    /** Runs the Rasch analysis on the ratings already read. */
    static Outcome of(StudyData data, MfrmOptions asked, AnchorFile.Anchors anchors, StudyDesign.Kind declared) {
        // condition is a crossed facet within candidates and describes candidates in parallel groups
        StudyDesign design = StudyDesign.of(data.ratings(), declared);
        MfrmOptions o;
        try {
            o = ConditionFacet.adapt(asked, design);
        } catch (MfrmRefusedException e) {
            return new Outcome(ConditionFacet.annotate(MfrmSection.refused(e.reasons()), asked, design, null,
                    data.ratings()), null, List.of());
        }
        Map<String, String> levels = new HashMap<>();
        Map<String, Map<String, String>> attributes = new HashMap<>();
        data.candidates().forEach(c -> {
            levels.put(c.id(), c.level());
            c.attributes().forEach((name, group) -> attributes.computeIfAbsent(name, k -> new HashMap<>()).put(c.id(), group));
        });
        List<String> columns = new ArrayList<>(o.facets());
        for (FacetPair p : o.biasPairs()) {
            for (String c : List.of(p.first(), p.second())) {
                if (!RatingData.CANDIDATE.equals(c) && !columns.contains(c)) {
                    columns.add(c);
                }
                // a declared attribute nobody has a value for: refused per rating below, not an unknown column
                if (!RatingData.CANDIDATE.equals(c) && !StudyRatings.COLUMNS.contains(c)) {
                    attributes.putIfAbsent(c, Map.of());
                }
            }
        }
        List<String> leftOut = new ArrayList<>();
        try {
            // the Wright map draws the candidates by level: the candidate table's level, else the ratings'
            Map<String, String> levelOf = new HashMap<>(levels);
            data.ratings().forEach(r -> {
                if (levelOf.getOrDefault(r.candidate(), "").isBlank() && r.level() != null
                        && !r.level().isBlank()) {
                    levelOf.put(r.candidate(), r.level());
                }
            });
            RatingData ratingData = StudyRatings.of(data.ratings(), levels, attributes, columns);
            MfrmOptions options = o;
            if (anchors != null) {
                MfrmOptions.Builder b = o.toBuilder();
                leftOut.addAll(anchors.applyTo(b, ratingData, o.facets(), o.structure()));
                options = b.build();
            }
            MfrmResult result = ManyFacetRasch.analyse(ratingData, options);
            return new Outcome(ConditionFacet.annotate(MfrmSection.of(result, levelOf), asked, design, result,
                    data.ratings()), result, leftOut);
        } catch (MfrmRefusedException e) {
            return new Outcome(ConditionFacet.annotate(MfrmSection.refused(e.reasons()), asked, design, null,
                    data.ratings()), null, leftOut);
        } catch (IllegalArgumentException e) {
            // an anchor the ratings cannot take (e.g. thresholds for another number of categories)
            return new Outcome(ConditionFacet.annotate(MfrmSection.refused(List.of(e.getMessage())), asked, design,
                    null, data.ratings()), null, leftOut);
        }
    }
}
