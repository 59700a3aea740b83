package org.inkgate.analysis.mfrm;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.IntStream;
import org.inkgate.analysis.mfrm.bias.BiasEstimation;
import org.inkgate.analysis.mfrm.bias.BiasPair;
import org.inkgate.analysis.mfrm.bias.InteractionAnalysis;
import org.inkgate.analysis.mfrm.bias.JointCellRefit;
import org.inkgate.analysis.mfrm.design.DesignCheck;
import org.inkgate.analysis.mfrm.design.ModelDesign;
import org.inkgate.analysis.mfrm.estimation.CategoryModel;
import org.inkgate.analysis.mfrm.estimation.Estimates;
import org.inkgate.analysis.mfrm.estimation.JmleEstimator;
import org.inkgate.analysis.mfrm.estimation.JointStandardErrors;
import org.inkgate.analysis.mfrm.fit.AdjustedScores;
import org.inkgate.analysis.mfrm.fit.RatingStatistics;
import org.inkgate.analysis.mfrm.fit.RawTotals;
import org.inkgate.analysis.mfrm.fit.Separation;

/**
 * Many-facet Rasch measurement (Linacre 1989): log(P_k / P_k-1) = B_candidate - sum of the other
 * facets' measures - F_k. Checks the design, sets extreme elements aside, estimates by JMLE,
 * estimates the extreme elements afterwards, then computes fit, separation, category, unexpected
 * rating and bias statistics.
 */
public final class ManyFacetRasch {
    /** Joint SEs this much larger than model SEs (RMS ratio) earn a warning. */
    private static final double SE_GAP = 1.2;
    /** Marks an element whose every rating involved an extreme element. */
    private static final int UNLINKED = 2;
    private static final String AFTER_EXTREMES = " after setting extreme scores aside";
    /** Anchored elements displaced by more than this many logits earn a warning (common practice, [memory]). */
    static final double DISPLACEMENT_LIMIT = 0.5;

    private ManyFacetRasch() {
    }

    /**
     * Runs the analysis.
     *
     * @throws MfrmRefusedException when the design cannot identify the measures or the scale has
     *                              a single category; nothing is estimated then
     */
    public static MfrmResult analyse(RatingData data, MfrmOptions options) {
        int nF = options.facets().size() + 1;
        String[] facetNames = new String[nF];
        String[][] labels = new String[nF][];
        int[][] elem = new int[nF][];
        facetNames[0] = RatingData.CANDIDATE;
        labels[0] = data.labels(-1);
        elem[0] = data.codesView(-1);
        for (int f = 1; f < nF; f++) {
            String name = options.facets().get(f - 1);
            int col = data.columnIndex(name);
            facetNames[f] = name;
            labels[f] = data.labels(col);
            elem[f] = data.codesView(col);
        }
        for (FacetPair pair : options.biasPairs()) {
            data.columnIndex(pair.first()); // unknown columns fail here, before any work
            data.columnIndex(pair.second());
        }
        int nObs = data.size();
        int[] scaleOf;
        String[] scaleLabels;
        int pcFacet = -1;
        if (options.structure() instanceof ScaleStructure.PartialCredit pc) {
            pcFacet = options.facets().indexOf(pc.facet()) + 1;
            scaleOf = elem[pcFacet];
            scaleLabels = labels[pcFacet];
        } else {
            scaleOf = new int[nObs];
            scaleLabels = new String[] {MfrmOptions.SHARED_SCALE};
        }
        List<String> notes = new ArrayList<>();
        List<String> refusals = new ArrayList<>();
        int[] category = new int[nObs];
        int[][] rawOf = ModelDesign.categoriesAsObserved(data.scoresView(), scaleOf, scaleLabels.length, category,
                scaleLabels, notes, refusals);
        if (!refusals.isEmpty()) {
            throw new MfrmRefusedException(refusals);
        }
        int[] rows = new int[nObs];
        Arrays.setAll(rows, i -> i);
        ModelDesign full = new ModelDesign(facetNames, labels, elem, category, scaleOf, scaleLabels, rawOf, rows);

        boolean[][] anchored = new boolean[nF][];
        double[][] measure = new double[nF][];
        for (int f = 0; f < nF; f++) {
            anchored[f] = new boolean[labels[f].length];
            measure[f] = new double[labels[f].length];
        }
        applyElementAnchors(options, facetNames, labels, anchored, measure);
        double[][] thresholds = new double[scaleLabels.length][];
        boolean[] scaleAnchored = new boolean[scaleLabels.length];
        for (int s = 0; s < scaleLabels.length; s++) {
            thresholds[s] = new double[rawOf[s].length];
        }
        applyThresholdAnchors(options, scaleLabels, rawOf, thresholds, scaleAnchored);

        List<String> problems = DesignCheck.problems(full, anchored, "");
        if (!problems.isEmpty()) {
            throw new MfrmRefusedException(problems);
        }
        int[][] extremeSide = new int[nF][];
        ModelDesign active = setExtremesAside(full, anchored, extremeSide);
        if (active.observationCount() == 0) {
            throw new MfrmRefusedException(List.of("every rating belongs to an extreme element (all ratings at"
                    + " the bottom or the top), so nothing can be estimated; check the scores"));
        }
        List<String> activeProblems = DesignCheck.problems(active, anchored, AFTER_EXTREMES);
        if (!activeProblems.isEmpty()) {
            throw new MfrmRefusedException(activeProblems);
        }
        List<String> lost = categoriesLostWithExtremes(active, scaleAnchored);
        if (!lost.isEmpty()) {
            throw new MfrmRefusedException(lost);
        }

        JmleEstimator estimator = new JmleEstimator(active, anchored, scaleAnchored, options.threads(), pcFacet);
        estimator.startingValues(measure, thresholds);
        Estimates est = estimator.estimate(measure, thresholds, options.maxLogitChange(), options.maxScoreResidual(),
                options.maxIterations());
        double[][] se = est.se();
        estimateExtremes(full, measure, se, thresholds, anchored, extremeSide);

        double[][] jointSe = est.jointSe() != null ? est.jointSe()
                : JointStandardErrors.of(active, measure, thresholds, anchored);
        RatingStatistics stats = new RatingStatistics(active, measure, thresholds, options.unexpectedZ(),
                options.unexpectedLimit());
        List<BiasPair> bias = new ArrayList<>();
        JointCellRefit joint = options.biasEstimation() == BiasEstimation.JOINT
                ? new JointCellRefit(active, measure, thresholds, anchored, scaleAnchored, pcFacet, options.threads(),
                options.maxLogitChange(), options.maxScoreResidual(), options.maxIterations()) : null;
        for (FacetPair pair : options.biasPairs()) {
            int ca = data.columnIndex(pair.first());
            int cb = data.columnIndex(pair.second());
            bias.add(InteractionAnalysis.analyse(active, measure, thresholds, pair.first(), data.codesView(ca),
                    data.labels(ca), pair.second(), data.codesView(cb), data.labels(cb), joint));
        }

        double factor = 1;
        if (options.lengthCorrection()) {
            double perCandidate = (double) active.observationCount() / countPresent(active, 0);
            factor = (perCandidate - 1) / perCandidate;
            notes.add(String.format(Locale.ROOT, "(L-1)/L correction applied: L = %.2f ratings per candidate,"
                    + " every measure and threshold multiplied by %.4f; fit statistics are from the uncorrected"
                    + " estimates", perCandidate, factor));
        }

        List<String> warnings = new ArrayList<>(est.warnings());
        List<MfrmResult.Facet> facets = new ArrayList<>();
        // one more pass over the ratings each, only when there are extreme or anchored elements to report
        boolean anyExtreme = Arrays.stream(extremeSide).anyMatch(sides -> Arrays.stream(sides).anyMatch(x -> x != 0));
        RawTotals totals = anyExtreme ? new RawTotals(full, measure, thresholds) : null;
        AdjustedScores adjusted = new AdjustedScores(active, measure, thresholds, pcFacet);
        // displacement over the ratings the estimation used (extreme elements' ratings carry no information)
        RawTotals estimated = options.elementAnchors().isEmpty() ? null : new RawTotals(active, measure, thresholds);
        for (int f = 0; f < nF; f++) {
            facets.add(facet(full, f, measure, se, jointSe, anchored, extremeSide, stats, totals, estimated, adjusted,
                    factor, warnings));
        }
        displacementWarning(facets, warnings);
        List<MfrmResult.Scale> scales = new ArrayList<>();
        for (int s = 0; s < scaleLabels.length; s++) {
            scales.add(scale(active, s, stats, est, thresholds, factor, scaleAnchored[s]));
        }
        List<MfrmResult.Unexpected> unexpected = unexpectedRatings(active, stats);
        String structure = pcFacet < 0 ? "rating scale" : "partial credit by " + facetNames[pcFacet];
        MfrmResult.Model model = new MfrmResult.Model(List.of(facetNames), structure, nObs, active.observationCount(),
                options.lengthCorrection(), factor, List.copyOf(notes));
        MfrmResult.Convergence conv = new MfrmResult.Convergence(est.converged(), est.iterations(),
                options.maxIterations(), est.maxResidual(), est.maxChange(), options.maxScoreResidual(),
                options.maxLogitChange());
        return new MfrmResult(model, conv, List.copyOf(facets), List.copyOf(scales), List.copyOf(unexpected),
                List.copyOf(bias), List.copyOf(warnings));
    }

    /** A category seen only in extreme elements' ratings has no data left for its threshold. */
    private static List<String> categoriesLostWithExtremes(ModelDesign active, boolean[] scaleAnchored) {
        List<String> out = new ArrayList<>();
        for (int s = 0; s < active.scaleCount(); s++) {
            int[] counts = new int[active.maxCategory(s) + 1];
            for (int n = 0; n < active.observationCount(); n++) {
                if (active.scales()[n] == s) {
                    counts[active.categories()[n]]++;
                }
            }
            for (int k = 0; k < counts.length; k++) {
                if (counts[k] == 0 && !scaleAnchored[s]) {
                    out.add("score " + active.rawScore(s, k) + " of scale '" + active.scaleLabel(s) + "' occurs only"
                            + " in extreme elements' ratings, so its threshold cannot be estimated; anchor the"
                            + " thresholds or collect more ratings");
                }
            }
        }
        return out;
    }

    private static List<MfrmResult.Unexpected> unexpectedRatings(ModelDesign active, RatingStatistics stats) {
        List<MfrmResult.Unexpected> out = new ArrayList<>();
        for (int i = 0; i < stats.unexpected.length; i++) {
            int n = stats.unexpected[i];
            Map<String, String> el = new LinkedHashMap<>();
            for (int f = 0; f < active.facetCount(); f++) {
                el.put(active.facetName(f), active.label(f, active.elements(f)[n]));
            }
            int s = active.scales()[n];
            out.add(new MfrmResult.Unexpected(active.rows()[n] + 1, el, active.rawScore(s, active.categories()[n]),
                    stats.unexpectedExpectedRaw[i], stats.unexpectedResidual[i], stats.unexpectedZ[i]));
        }
        return out;
    }

    private static int countPresent(ModelDesign d, int f) {
        boolean[] seen = new boolean[d.elementCount(f)];
        int c = 0;
        for (int e : d.elements(f)) {
            if (!seen[e]) {
                seen[e] = true;
                c++;
            }
        }
        return c;
    }

    private static void applyElementAnchors(MfrmOptions o, String[] facetNames, String[][] labels,
                                            boolean[][] anchored, double[][] measure) {
        List<String> names = List.of(facetNames);
        for (Map.Entry<String, Map<String, Double>> en : o.elementAnchors().entrySet()) {
            int f = names.indexOf(en.getKey());
            if (f < 0) {
                throw new IllegalArgumentException("anchor for '" + en.getKey() + "', which is not a modelled facet "
                        + names);
            }
            List<String> ls = List.of(labels[f]);
            for (Map.Entry<String, Double> a : en.getValue().entrySet()) {
                int e = ls.indexOf(a.getKey());
                if (e < 0) {
                    throw new IllegalArgumentException("anchor for " + en.getKey() + " '" + a.getKey()
                            + "', which does not occur in the ratings");
                }
                if (!Double.isFinite(a.getValue())) {
                    throw new IllegalArgumentException("anchor for " + en.getKey() + " '" + a.getKey()
                            + "' is not a finite number of logits");
                }
                anchored[f][e] = true;
                measure[f][e] = a.getValue();
            }
        }
    }

    private static void applyThresholdAnchors(MfrmOptions o, String[] scaleLabels, int[][] rawOf,
                                              double[][] thresholds, boolean[] scaleAnchored) {
        List<String> ls = List.of(scaleLabels);
        for (Map.Entry<String, double[]> en : o.thresholdAnchors().entrySet()) {
            int s = ls.indexOf(en.getKey());
            if (s < 0) {
                throw new IllegalArgumentException("threshold anchors for scale '" + en.getKey() + "'; the scales are "
                        + ls);
            }
            int m = rawOf[s].length - 1;
            if (en.getValue().length != m) {
                throw new IllegalArgumentException("threshold anchors for scale '" + en.getKey() + "' give "
                        + en.getValue().length + " values; the observed categories " + Arrays.toString(rawOf[s])
                        + " need " + m);
            }
            System.arraycopy(en.getValue(), 0, thresholds[s], 1, m);
            scaleAnchored[s] = true;
        }
    }

    /**
     * Repeatedly sets aside elements whose ratings are all at the bottom or all at the top
     * (-1 / +1 in {@code side}), with their ratings, until none is left (Wright & Masters 1982).
     */
    private static ModelDesign setExtremesAside(ModelDesign d, boolean[][] anchored, int[][] side) {
        int nF = d.facetCount();
        for (int f = 0; f < nF; f++) {
            side[f] = new int[d.elementCount(f)];
        }
        boolean[] keep = new boolean[d.observationCount()];
        Arrays.fill(keep, true);
        boolean changed = true;
        while (changed) {
            changed = false;
            for (int f = 0; f < nF; f++) {
                double[] sum = new double[d.elementCount(f)];
                double[] max = new double[d.elementCount(f)];
                int[] cnt = new int[d.elementCount(f)];
                int[] el = d.elements(f);
                for (int n = 0; n < keep.length; n++) {
                    if (keep[n]) {
                        sum[el[n]] += d.categories()[n];
                        max[el[n]] += d.maxCategory(d.scales()[n]);
                        cnt[el[n]]++;
                    }
                }
                boolean any = false;
                for (int e = 0; e < cnt.length; e++) {
                    if (cnt[e] > 0 && !anchored[f][e] && (sum[e] == 0 || sum[e] == max[e])) {
                        side[f][e] = sum[e] == 0 ? -1 : 1;
                        any = true;
                    }
                }
                if (any) {
                    for (int n = 0; n < keep.length; n++) {
                        if (keep[n] && side[f][el[n]] != 0) {
                            keep[n] = false;
                        }
                    }
                    changed = true;
                }
            }
        }
        // elements left without ratings (all of them were with extreme elements) are estimated
        // afterwards too, from their own ratings
        for (int f = 0; f < nF; f++) {
            boolean[] has = new boolean[d.elementCount(f)];
            boolean[] any = new boolean[d.elementCount(f)];
            int[] el = d.elements(f);
            for (int n = 0; n < keep.length; n++) {
                any[el[n]] = true;
                has[el[n]] |= keep[n];
            }
            for (int e = 0; e < has.length; e++) {
                if (any[e] && !has[e] && side[f][e] == 0 && !anchored[f][e]) {
                    side[f][e] = UNLINKED;
                }
            }
        }
        int k = 0;
        for (boolean b : keep) {
            k += b ? 1 : 0;
        }
        int[] idx = new int[k];
        k = 0;
        for (int n = 0; n < keep.length; n++) {
            if (keep[n]) {
                idx[k++] = n;
            }
        }
        return k == keep.length ? d : d.select(idx);
    }

    /**
     * Estimates each extreme element from all its ratings, everything else held at its estimate,
     * with its score moved 0.5 inwards (a common convention; Wright & Masters 1982 discuss extreme
     * scores). Gauss-Seidel rounds, since an extreme rater's ratings may involve extreme candidates.
     */
    private static void estimateExtremes(ModelDesign d, double[][] measure, double[][] se, double[][] thresholds,
                                         boolean[][] anchored, int[][] side) {
        int nF = d.facetCount();
        boolean anyExtreme = false;
        for (int f = 0; f < nF; f++) {
            for (int e = 0; e < side[f].length; e++) {
                anyExtreme |= side[f][e] != 0;
            }
        }
        if (!anyExtreme) {
            return;
        }
        double[] p = new double[d.maxCategoryOverall() + 1];
        int[] involved = IntStream.range(0, d.observationCount()).filter(n -> {
            for (int f = 0; f < nF; f++) {
                if (side[f][d.elements(f)[n]] != 0) {
                    return true;
                }
            }
            return false;
        }).toArray();
        for (int round = 0; round < 200; round++) {
            double[][] obs = new double[nF][];
            double[][] max = new double[nF][];
            double[][] exp = new double[nF][];
            double[][] info = new double[nF][];
            for (int f = 0; f < nF; f++) {
                obs[f] = new double[side[f].length];
                max[f] = new double[side[f].length];
                exp[f] = new double[side[f].length];
                info[f] = new double[side[f].length];
            }
            for (int n : involved) {
                double eta = measure[0][d.elements(0)[n]];
                for (int f = 1; f < nF; f++) {
                    eta -= measure[f][d.elements(f)[n]];
                }
                int s = d.scales()[n];
                int m = d.maxCategory(s);
                CategoryModel.probabilities(eta, thresholds[s], m, p);
                double e1 = 0;
                double e2 = 0;
                for (int k = 1; k <= m; k++) {
                    e1 += k * p[k];
                    e2 += k * k * p[k];
                }
                for (int f = 0; f < nF; f++) {
                    int e = d.elements(f)[n];
                    if (side[f][e] != 0) {
                        obs[f][e] += d.categories()[n];
                        max[f][e] += m;
                        exp[f][e] += e1;
                        info[f][e] += e2 - e1 * e1;
                    }
                }
            }
            double change = 0;
            for (int f = 0; f < nF; f++) {
                for (int e = 0; e < side[f].length; e++) {
                    if (side[f][e] == 0) {
                        continue;
                    }
                    double target = side[f][e] < 0 ? 0.5 : side[f][e] == 1 ? max[f][e] - 0.5
                            : obs[f][e] == 0 ? 0.5 : obs[f][e] == max[f][e] ? max[f][e] - 0.5 : obs[f][e];
                    double step = Math.max(-1, Math.min(1, (target - exp[f][e]) / info[f][e]));
                    measure[f][e] += f == 0 ? step : -step;
                    se[f][e] = 1 / Math.sqrt(info[f][e]);
                    change = Math.max(change, Math.abs(step));
                }
            }
            if (change < 1e-6) {
                break;
            }
        }
    }

    private static MfrmResult.Facet facet(ModelDesign full, int f, double[][] measure, double[][] se,
                                          double[][] jointSe, boolean[][] anchored, int[][] side,
                                          RatingStatistics st, RawTotals totals, RawTotals estimated,
                                          AdjustedScores adjusted, double factor,
                                          List<String> warnings) {
        List<MfrmResult.Element> elements = new ArrayList<>();
        double[] ms = new double[full.elementCount(f)];
        double[] ses = new double[full.elementCount(f)];
        double[] joint = new double[full.elementCount(f)];
        int used = 0;
        int extremes = 0;
        for (int e = 0; e < full.elementCount(f); e++) {
            MfrmResult.Status status = anchored[f][e] ? MfrmResult.Status.ANCHORED
                    : side[f][e] < 0 ? MfrmResult.Status.EXTREME_MINIMUM
                    : side[f][e] == 1 ? MfrmResult.Status.EXTREME_MAXIMUM
                    : side[f][e] == UNLINKED ? MfrmResult.Status.ONLY_WITH_EXTREMES : MfrmResult.Status.ESTIMATED;
            double m = anchored[f][e] ? measure[f][e] : measure[f][e] * factor;
            if (side[f][e] != 0) {
                extremes++;
                // counted over all ratings: the residual statistics never saw these elements' ratings
                int all = totals.count[f][e];
                elements.add(new MfrmResult.Element(full.label(f, e), status, m, se[f][e], Double.NaN, all,
                        totals.observedRaw[f][e], totals.expectedRaw[f][e], totals.observedRaw[f][e] / all,
                        Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                        adjusted.at(f, e, measure[f][e]), band(adjusted, f, e, measure[f][e], -se[f][e]),
                        band(adjusted, f, e, measure[f][e], se[f][e])));
                continue;
            }
            int cnt = st.count[f][e];
            elements.add(new MfrmResult.Element(full.label(f, e), status, m, se[f][e], jointSe[f][e], cnt,
                    st.observedRaw[f][e],
                    st.expectedRaw[f][e], st.observedRaw[f][e] / cnt, st.infit[f][e], st.infitZ[f][e],
                    st.outfit[f][e], st.outfitZ[f][e], st.pointMeasure[f][e],
                    anchored[f][e] ? displacement(f, estimated.observedRaw[f][e] - estimated.expectedRaw[f][e],
                            estimated.slope[f][e]) : Double.NaN,
                    adjusted.at(f, e, measure[f][e]), band(adjusted, f, e, measure[f][e], -bandSe(se, jointSe, f, e)),
                    band(adjusted, f, e, measure[f][e], bandSe(se, jointSe, f, e))));
            if (cnt > 0) {
                ms[used] = m;
                ses[used] = se[f][e];
                joint[used] = jointSe[f][e];
                used++;
            }
        }
        if (extremes > 0) {
            warnings.add(extremes + " " + full.facetName(f) + " element(s) had extreme scores (every rating at the"
                    + " bottom or top) or were rated only with such elements: their measures are estimated"
                    + " afterwards (extreme ones at a score 0.5 from the extreme), are less certain than their SE"
                    + " suggests, have no fit statistics and are left out of the facet summary");
        }
        boolean jointKnown = f > 0 && used > 0;
        double model2 = 0;
        double joint2 = 0;
        for (int i = 0; i < used; i++) {
            jointKnown &= Double.isFinite(joint[i]);
            model2 += ses[i] * ses[i];
            joint2 += joint[i] * joint[i];
        }
        if (jointKnown && joint2 > model2 * SE_GAP * SE_GAP) {
            warnings.add(String.format(Locale.ROOT, "%s: the joint SEs are on average %.0f%% larger than the model"
                    + " SEs - the design links these elements only loosely (e.g. few shared candidates), so use"
                    + " jointSe and summaryJointSe, not se and summary, to compare them", full.facetName(f),
                    100 * (Math.sqrt(joint2 / model2) - 1)));
        }
        return new MfrmResult.Facet(full.facetName(f), List.copyOf(elements),
                Separation.of(Arrays.copyOf(ms, used), Arrays.copyOf(ses, used)),
                jointKnown ? Separation.of(Arrays.copyOf(ms, used), Arrays.copyOf(joint, used)) : null);
    }

    /** The 95% band's SE: the joint SE where there is one (non-candidate facets), else the model SE. */
    private static double bandSe(double[][] se, double[][] jointSe, int f, int e) {
        return f > 0 && Double.isFinite(jointSe[f][e]) ? jointSe[f][e] : se[f][e];
    }

    /**
     * The adjusted score at measure + 1.96 signedSe, turned so that a negative signedSe gives the
     * lower end: a higher measure raises a candidate's score and lowers any other element's.
     */
    private static double band(AdjustedScores adjusted, int f, int e, double m, double signedSe) {
        if (!Double.isFinite(signedSe)) {
            return Double.NaN;
        }
        return adjusted.at(f, e, m + (f == 0 ? 1 : -1) * 1.96 * signedSe);
    }

    /**
     * One Newton step from the anchor: the logit change that would make the element's expected score
     * equal its observed score. Candidates measure ability (up with the score), the other facets
     * difficulty or severity (down with it).
     */
    private static double displacement(int f, double observedMinusExpected, double slope) {
        double step = observedMinusExpected / slope;
        return f == 0 ? step : -step;
    }

    /** Anchored elements displaced past the limit, as one warning. */
    private static void displacementWarning(List<MfrmResult.Facet> facets, List<String> warnings) {
        List<String> far = new ArrayList<>();
        for (MfrmResult.Facet f : facets) {
            for (MfrmResult.Element e : f.elements()) {
                if (Math.abs(e.displacement()) > DISPLACEMENT_LIMIT) {
                    far.add(String.format(Locale.ROOT, "%s %s %+.2f", f.name(), e.label(), e.displacement()));
                }
            }
        }
        if (!far.isEmpty()) {
            warnings.add(String.format(Locale.ROOT, "%d anchored element(s) are displaced by more than %.1f logit"
                    + " (common practice limit): %s. The data here disagree with the anchor values; check that"
                    + " the anchors belong to these elements and scale before reporting on the anchored scale",
                    far.size(), DISPLACEMENT_LIMIT, String.join(", ", far)));
        }
    }

    private static MfrmResult.Scale scale(ModelDesign d, int s, RatingStatistics st, Estimates est,
                                          double[][] thresholds, double factor, boolean anchored) {
        int m = d.maxCategory(s);
        int total = 0;
        for (int c : st.categoryCount[s]) {
            total += c;
        }
        List<MfrmResult.Category> cats = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        for (int k = 0; k <= m; k++) {
            double thr = k == 0 ? Double.NaN : anchored ? thresholds[s][k] : thresholds[s][k] * factor;
            double thrSe = k == 0 ? Double.NaN : est.thresholdSe()[s][k];
            double thrJoint = k == 0 || est.thresholdJointSe() == null ? Double.NaN : est.thresholdJointSe()[s][k];
            cats.add(new MfrmResult.Category(d.rawScore(s, k), st.categoryCount[s][k],
                    100.0 * st.categoryCount[s][k] / total, st.averageMeasure[s][k], st.expectedAverageMeasure[s][k],
                    st.categoryOutfit[s][k], thr, thrSe, thrJoint));
            if (k >= 2 && thresholds[s][k] < thresholds[s][k - 1]) {
                notes.add("thresholds " + d.rawScore(s, k - 1) + "->" + d.rawScore(s, k) + " are disordered (F"
                        + k + " < F" + (k - 1) + "): category " + d.rawScore(s, k - 1) + " is never the most likely"
                        + " rating anywhere on the scale; review the rubric wording or consider combining categories");
            }
            if (k >= 1 && st.averageMeasure[s][k] < st.averageMeasure[s][k - 1]) {
                notes.add("average measure of category " + d.rawScore(s, k) + " is below that of category "
                        + d.rawScore(s, k - 1) + " (they should advance with the category)");
            }
            if (st.categoryCount[s][k] < 10) {
                notes.add("category " + d.rawScore(s, k) + " has " + st.categoryCount[s][k] + " ratings; fewer than 10"
                        + " makes its threshold unstable (common practice guideline)");
            }
        }
        return new MfrmResult.Scale(d.scaleLabel(s), List.copyOf(cats), List.copyOf(notes));
    }
}
