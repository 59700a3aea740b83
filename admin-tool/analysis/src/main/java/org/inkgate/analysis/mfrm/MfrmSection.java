package org.inkgate.analysis.mfrm;

import static org.inkgate.analysis.report.StatisticColumns.*;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.inkgate.analysis.mfrm.bias.BiasCell;
import org.inkgate.analysis.mfrm.bias.BiasEstimation;
import org.inkgate.analysis.mfrm.bias.BiasPair;
import org.inkgate.analysis.mfrm.chart.BiasChart;
import org.inkgate.analysis.mfrm.chart.CategoryCurves;
import org.inkgate.analysis.mfrm.chart.WrightMap;
import org.inkgate.analysis.mfrm.fit.Separation;
import org.inkgate.analysis.report.Chart;
import org.inkgate.analysis.report.Column;
import org.inkgate.analysis.report.PValueText;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.report.Table;

/**
 * The many-facet Rasch analysis as a report section (id {@code mfrm}): the model, convergence,
 * warnings and refusals in plain words next to the results; facet summaries, element, category,
 * bias and unexpected-rating tables; Wright map, category curves and bias charts; and
 * {@link MfrmResult#summary()} under {@code mfrm.*} in summary.json (docs/analysis.md).
 */
public final class MfrmSection {

    /** The section id and summary.json key prefix. */
    public static final String ID = "mfrm";
    private static final String TITLE = "Many-facet Rasch measurement";
    /** Threshold sets drawn as category curves; the table lists all. */
    private static final int CURVES_DRAWN = 6;
    /** Common-practice range of mean-squares for usable ratings (docs/analysis.md). */
    private static final double FIT_LOW = 0.5;
    private static final double FIT_HIGH = 1.5;
    private static final String READ_FIRST = "Read this first: the measures are only as good as the design and the"
            + " model's fit. They are evidence for the test owner's decisions, not the decisions: decisions about"
            + " individual candidates follow the test owner's regulations. Do not use measures from a run with"
            + " warnings (below) without reading them.";

    private MfrmSection() {
    }

    /**
     * Runs the analysis and returns its section; a refused design gives the refusal section
     * (see {@link #refused}) instead of an exception, so the rest of the report is unaffected.
     */
    public static Section analyse(RatingData data, MfrmOptions options) {
        return analyse(data, options, Map.of());
    }

    /**
     * As {@link #analyse(RatingData, MfrmOptions)}, with each candidate's level for the Wright map's
     * distribution by level; a level column of the data, when there is one, is used first.
     */
    public static Section analyse(RatingData data, MfrmOptions options, Map<String, String> levelOf) {
        try {
            return of(ManyFacetRasch.analyse(data, options), levelsOf(data, levelOf));
        } catch (MfrmRefusedException e) {
            return refused(e.reasons());
        }
    }

    private static Map<String, String> levelsOf(RatingData data, Map<String, String> levelOf) {
        Map<String, String> out = new HashMap<>(levelOf);
        int column = data.columns().indexOf("level");
        if (column >= 0) {
            String[] candidates = data.labels(-1);
            String[] levels = data.labels(column);
            int[] c = data.codesView(-1);
            int[] l = data.codesView(column);
            for (int i = 0; i < c.length; i++) {
                out.putIfAbsent(candidates[c[i]], levels[l[i]]);
            }
        }
        return out;
    }

    /** The section for a refused run: why nothing was estimated and what to do. */
    public static Section refused(List<String> reasons) {
        Section.Builder s = Section.builder(ID, TITLE);
        s.paragraph("NOT RUN. The many-facet Rasch analysis was refused: the ratings cannot support the requested"
                + " model, so nothing was estimated and no measure is shown. The other sections of this report do"
                + " not depend on it.");
        for (String r : reasons) {
            s.paragraph("Reason: " + r);
        }
        s.paragraph("What to do: fix the design or data as each reason says (for example add linking ratings, anchor"
                + " an element in every disconnected subset, or leave out a facet that is confounded with another),"
                + " or model fewer facets. Whether measures from a changed model may be used is for the test owner's"
                + " regulations to decide.");
        s.put("available", false);
        s.put("refusal", List.copyOf(reasons));
        return s.build();
    }

    /** The section for a finished run, the candidates in one distribution on the Wright map. */
    public static Section of(MfrmResult r) {
        return of(r, Map.of());
    }

    /** The section for a finished run, the Wright map's candidates by level (candidate label to level). */
    public static Section of(MfrmResult r, Map<String, String> levelOf) {
        Section.Builder s = Section.builder(ID, TITLE);
        s.paragraph(READ_FIRST);
        s.paragraph(modelText(r));
        s.paragraph(convergenceText(r.convergence()));
        r.model().notes().forEach(n -> s.paragraph("Note: " + n + "."));
        if (r.warnings().isEmpty()) {
            s.paragraph("No warnings were raised (fit, separation and category use still need reading below).");
        } else {
            r.warnings().forEach(w -> s.paragraph("WARNING: " + w));
        }
        s.chart(new Chart("chart_mfrm_wright_map", "Wright map", "Candidates and the elements of every other facet"
                + " on one logit scale (Wright & Stone 1979; Linacre 1989), more able or harder to the right. Top:"
                + " the candidates' measures as a distribution per level (share of the level per quarter logit,"
                + " median marked). Then each facet, one row per element, highest first: the point is the measure,"
                + " the whisker its 95% interval (measure +- 1.96 standard errors, joint where available); two"
                + " elements whose whiskers overlap widely are not clearly different. Last (or under each element"
                + " with partial credit): the score zones, where each score is the most likely rating for a"
                + " candidate at that point facing elements at 0, bounded by the Rasch-Andrich thresholds.",
                WrightMap.drawing(r, levelOf)));
        s.table(facetTable(r));
        Set<String> ids = new HashSet<>();
        // the other facets first: they are few and usually what the study is about; the
        // candidates' long table follows the category, bias and unexpected-rating tables
        for (MfrmResult.Facet f : r.facets().subList(1, r.facets().size())) {
            s.table(elementTable(f, unique(ids, "mfrm_elements_" + slug(f.name()))));
        }
        s.table(categoryTable(r));
        for (int i = 0; i < Math.min(CURVES_DRAWN, r.scales().size()); i++) {
            MfrmResult.Scale sc = r.scales().get(i);
            String caption = "Probability of each category against the measure relative to the rating's combined"
                    + " difficulty (candidate minus the other facets), from the estimated thresholds. Every category"
                    + " should be the most likely somewhere; adjacent curves cross at the thresholds.";
            if (i == CURVES_DRAWN - 1 && r.scales().size() > CURVES_DRAWN) {
                caption += " Only the first " + CURVES_DRAWN + " of " + r.scales().size()
                        + " threshold sets are drawn; the category table lists all.";
            }
            s.chart(new Chart("chart_mfrm_categories_" + i, r.scales().size() == 1 ? "Category probability curves"
                    : "Category probability curves: " + sc.label(), caption, CategoryCurves.drawing(r, i)));
        }
        if (!r.bias().isEmpty()) {
            s.table(biasSummaryTable(r.bias(), r.model().facets()));
            int i = 0;
            for (BiasPair b : r.bias()) {
                String id = unique(ids, "mfrm_bias_" + slug(b.first()) + "_" + slug(b.second()));
                s.table(biasTable(b, id));
                s.chart(new Chart("chart_mfrm_bias_" + i++, "Bias: " + b.first() + " x " + b.second(),
                        "Bias sizes with 95% intervals (size +- 1.96 SE) for the cells with the largest |t| (at most"
                        + " 30). Right of 0: the combination scores higher than the main effects expect. Red: p <"
                        + " 0.05, not adjusted for the many tests.", BiasChart.drawing(b)));
            }
        }
        s.table(unexpectedTable(r));
        MfrmResult.Facet candidates = r.facets().get(0);
        s.table(elementTable(candidates, unique(ids, "mfrm_elements_" + slug(candidates.name()))));
        s.put("available", true);
        r.summary().forEach(s::put);
        return s.build();
    }

    private static String modelText(MfrmResult r) {
        List<String> facets = r.model().facets();
        StringBuilder eq = new StringBuilder("log(P_k / P_k-1) = B(").append(facets.get(0)).append(')');
        for (int i = 1; i < facets.size(); i++) {
            eq.append(" - D(").append(facets.get(i)).append(')');
        }
        String structure = r.model().structure();
        boolean partial = structure.startsWith("partial credit by ");
        // partial credit: the thresholds belong to the element of the named facet in the rating
        eq.append(partial ? " - F_k(" + structure.substring("partial credit by ".length()) + ")" : " - F_k");
        return "Model: " + eq + " (Linacre 1989), estimated by joint maximum likelihood. Facets: "
                + String.join(", ", facets) + ". Structure: " + r.model().structure()
                + (partial ? " (one threshold set per element, Masters 1982)" : " (one threshold set for all"
                + " ratings, Andrich 1978)") + ". Measures are in logits: candidates higher = more able; every other"
                + " facet higher = harder or more severe (lowers expected scores); each non-candidate facet is"
                + " centred at 0 unless anchored. Ratings: " + r.model().ratings() + ", of which "
                + r.model().ratingsEstimated() + " entered the joint estimation (the rest belong to extreme elements,"
                + " estimated afterwards).";
    }

    private static String convergenceText(MfrmResult.Convergence c) {
        String figures = String.format(Locale.ROOT, "largest score residual %.4g (limit %.4g), largest logit change"
                + " %.4g (limit %.4g)", c.maxScoreResidual(), c.residualLimit(), c.maxLogitChange(), c.changeLimit());
        if (c.converged()) {
            return "Convergence: reached after " + c.iterations() + " iterations: " + figures + ".";
        }
        return "NOT CONVERGED: estimation stopped at the iteration cap (" + c.maxIterations() + ") with " + figures
                + ". Treat every measure, SE and fit value below as provisional; do not base decisions on them.";
    }

    private static Table facetTable(MfrmResult r) {
        Table.Builder t = Table.builder("mfrm_facets", "Facet summaries")
                .method("Mean, population SD, RMSE of SEs, true SD, separation G, reliability G^2/(1+G^2), strata"
                        + " (4G+1)/3 and the fixed chi-square that all elements are equal, over non-extreme elements;"
                        + " once from the model SEs and, for non-candidate facets, once from the joint SEs",
                        "Wright & Masters 1982, ch. 5; Wright 1996 (RMT 9:4)")
                .columns(FACET, STANDARD_ERROR_BASIS, ELEMENTS, MEAN, STANDARD_DEVIATION, ROOT_MEAN_SQUARE_ERROR,
                        TRUE_STANDARD_DEVIATION, SEPARATION, RELIABILITY, STRATA, CHI_SQUARE, DEGREES_OF_FREEDOM,
                        P_VALUE);
        for (MfrmResult.Facet f : r.facets()) {
            separationRow(t, f.name(), "model", f.separation());
            if (f.separationJointSe() != null) {
                separationRow(t, f.name(), "joint", f.separationJointSe());
            }
        }
        t.note("Model SEs treat every other measure as known and are optimistic in sparse designs (raters linked"
                + " only through shared candidates); prefer the joint-SE rows there.");
        t.note("For raters, high separation and reliability mean the raters differ in severity: usually a finding to"
                + " act on, not a quality to celebrate. For candidates, reliability is the share of observed variance"
                + " that is true variance.");
        t.note("Extreme elements (every rating at one end of the scale) are left out of these summaries.");
        if (r.facets().stream().anyMatch(f -> f.separation().p() < PValueText.FLOOR
                || f.separationJointSe() != null && f.separationJointSe().p() < PValueText.FLOOR)) {
            t.note("A p-value shown as " + PValueText.BELOW_FLOOR + " is below what double precision resolves; the CSV"
                    + " keeps the computed number (often 0).");
        }
        if (r.facets().stream().anyMatch(f -> f.separation().count() == 2)) {
            t.note("With two elements (e.g. two conditions) separation and reliability rest on one difference and say"
                + " little; read the measures and their joint SEs instead.");
        }
        return t.build();
    }

    private static void separationRow(Table.Builder t, String facet, String basis, Separation s) {
        // a centred facet's mean is 0 up to rounding noise (1e-17), which would print as a number
        double mean = Math.abs(s.mean()) < 1e-12 ? 0.0 : s.mean();
        t.row(facet, basis, (long) s.count(), mean, s.sd(), s.rmse(), s.trueSd(), s.separation(), s.reliability(),
                s.strata(), s.chiSquare(), (long) s.df(), s.p());
    }

    private static Table elementTable(MfrmResult.Facet f, String id) {
        boolean candidates = f.separationJointSe() == null;
        Table.Builder t = Table.builder(id, "Measures: " + f.name())
                .method("Joint maximum likelihood measures with model SE (and joint SE for non-candidate facets);"
                        + " infit (information-weighted) and outfit (unweighted) mean-squares, standardised by the"
                        + " Wilson-Hilferty cube root; point-measure correlation",
                        "Linacre 1989; Wright & Masters 1982, ch. 5 and pp. 100-101")
                .columns(ELEMENT, STATUS, MEASURE, STANDARD_ERROR, JOINT_STANDARD_ERROR, RATINGS, OBSERVED_SCORE,
                        EXPECTED_SCORE, OBSERVED_AVERAGE, INFIT_MEAN_SQUARE, INFIT_STANDARDISED, OUTFIT_MEAN_SQUARE,
                        OUTFIT_STANDARDISED, POINT_MEASURE_CORRELATION, FIT_FLAG, DISPLACEMENT, ADJUSTED_SCORE,
                        ADJUSTED_SCORE_LOW, ADJUSTED_SCORE_HIGH);
        List<MfrmResult.Element> sorted = new ArrayList<>(f.elements());
        sorted.sort(Comparator.comparingDouble((MfrmResult.Element e) -> Double.isNaN(e.measure())
                ? Double.POSITIVE_INFINITY : -e.measure()));
        int noisy = 0;
        int muted = 0;
        int negative = 0;
        for (MfrmResult.Element e : sorted) {
            String flag = fitFlag(e);
            if (flag.contains("misfit")) {
                noisy++;
            }
            if (flag.contains("overfit")) {
                muted++;
            }
            if (e.pointMeasure() < 0) {
                negative++;
            }
            t.row(e.label(), e.status().name().toLowerCase(Locale.ROOT), e.measure(), e.se(), e.jointSe(),
                    (long) e.count(), e.observedScore(), e.expectedScore(), e.observedAverage(), e.infit(),
                    e.infitZ(), e.outfit(), e.outfitZ(), e.pointMeasure(), flag, e.displacement(), e.adjustedScore(),
                    e.adjustedLow(), e.adjustedHigh());
        }
        if (f.elements().stream().anyMatch(e -> e.status() == MfrmResult.Status.ANCHORED)) {
            t.note(String.format(Locale.ROOT, "Status anchored: the measure was fixed from the anchor file, not"
                    + " estimated. Displacement: the logit change the data here ask for (one Newton step from the"
                    + " anchor); beyond %.1f logit (common practice) the anchor is in doubt and a warning says so.",
                    ManyFacetRasch.DISPLACEMENT_LIMIT));
        }
        t.note("Adjusted score: the expected raw score of one rating with every other facet at its mean (" + (candidates
                ? "rater severity, task difficulty and the other facets taken out" : "an average candidate, the other"
                + " facets at their means") + "), on the scale's raw scores; the 95% band is the same at the measure"
                + " -+ 1.96 " + (candidates ? "model SE" : "joint SE") + ".");
        t.note("Sorted by measure, highest first. " + (candidates ? "Higher = more able." : "Higher = harder or more"
                + " severe (lowers expected scores)."));
        t.note("Fit: mean-squares near 1 fit the model; above 1 the ratings are noisier than the model expects,"
                + " below 1 more predictable (e.g. a rater using only the middle categories). There are no"
                + " universal cut-offs; the flag uses 0.5-1.5, a common-practice guideline for usable ratings.");
        if (noisy + muted > 0) {
            t.note(noisy + " element(s) with infit or outfit above " + FIT_HIGH + " and " + muted + " below " + FIT_LOW
                    + ": read their ratings before using their measures.");
        }
        if (negative > 0) {
            t.note(negative + " element(s) have a negative point-measure correlation: their ratings run against"
                    + " the measures (a reversed scale, a miskeyed score or a misunderstood rubric); check them.");
        }
        if (!candidates) {
            t.note("The joint SE also carries the uncertainty of the candidates and other facets an element is linked"
                    + " through; prefer it to the model SE when comparing elements in an incomplete design.");
        }
        t.note("Status: estimated; anchored (fixed by the user); extreme_minimum / extreme_maximum (every rating at"
                + " one end: estimated afterwards at a score 0.5 from the extreme, no fit values); only_with_extremes"
                + " (every rating was with an extreme element).");
        return t.build();
    }

    private static String fitFlag(MfrmResult.Element e) {
        boolean high = e.infit() > FIT_HIGH || e.outfit() > FIT_HIGH;
        boolean low = e.infit() < FIT_LOW || e.outfit() < FIT_LOW;
        if (high && low) {
            return "misfit and overfit";
        }
        return high ? "misfit" : low ? "overfit" : "";
    }

    private static Table categoryTable(MfrmResult r) {
        boolean partial = r.model().structure().startsWith("partial credit");
        Table.Builder t = Table.builder("mfrm_categories", "Rating scale categories")
                .method("Category counts, average and expected average measures, outfit mean-square; Rasch-Andrich"
                        + " thresholds F_k with model SE (own information) and joint SE",
                        partial ? "Masters 1982; Andrich 1978; Linacre 1989" : "Andrich 1978; Linacre 1989")
                .columns(SCALE, SCORE, RATINGS, PERCENT, AVERAGE_MEASURE, EXPECTED_AVERAGE_MEASURE,
                        OUTFIT_MEAN_SQUARE, THRESHOLD, THRESHOLD_STANDARD_ERROR, THRESHOLD_JOINT_STANDARD_ERROR);
        for (MfrmResult.Scale sc : r.scales()) {
            for (MfrmResult.Category c : sc.categories()) {
                t.row(sc.label(), (long) c.score(), (long) c.count(), c.percent(), c.averageMeasure(),
                        c.expectedAverageMeasure(), c.outfit(), c.threshold(), c.thresholdSe(), c.thresholdJointSe());
            }
            sc.notes().forEach(n -> t.note((r.scales().size() == 1 ? "" : sc.label() + ": ") + n));
        }
        t.note("Categories are the observed scores in order. Average measures should advance with the score;"
                + " thresholds should advance too (otherwise a category is never the most likely rating). Fewer than"
                + " 10 ratings in a category makes its threshold unstable (common-practice guideline). The lowest"
                + " category has no threshold. Prefer the joint SE; the model SE uses the threshold's own information"
                + " only.");
        return t.build();
    }

    private static Table biasSummaryTable(List<BiasPair> pairs, List<String> modelled) {
        Table.Builder t = Table.builder("mfrm_bias", "Bias / interaction pairs")
                .method("One extra term per combination, estimated as the pair's estimation column says; chi-square ="
                        + " sum of t^2 over non-extreme cells with df >= 1", "Linacre 1989")
                .columns(PAIR, ESTIMATION, CELLS, CHI_SQUARE, DEGREES_OF_FREEDOM, P_VALUE, SIGNIFICANT_CELLS);
        List<String> absorbing = new ArrayList<>();
        for (BiasPair b : pairs) {
            t.row(b.first() + " x " + b.second(), b.estimation().description(), (long) b.cells().size(),
                    b.chiSquare(), (long) b.df(), b.p(), (long) b.significantCells());
            boolean bothModelled = (modelled.contains(b.first()) || b.first().equals(RatingData.CANDIDATE))
                    && (modelled.contains(b.second()) || b.second().equals(RatingData.CANDIDATE));
            if (b.estimation() == BiasEstimation.MAIN_EFFECTS_FIXED && bothModelled) {
                absorbing.add(b.first() + " x " + b.second());
            }
            if (b.notEstimable() > 0) {
                t.note(b.first() + " x " + b.second() + ": " + b.notEstimable() + " combination(s) could not be"
                        + " estimated jointly (confounded with a main effect, or the refit did not converge); their"
                        + " size is empty.");
            }
        }
        t.note("Many cells mean many tests: with 100 cells about 5 have p < 0.05 by chance; the cell p-values are not"
                + " adjusted.");
        if (!absorbing.isEmpty()) {
            t.note("Applies to " + String.join(", ", absorbing) + ": both columns are modelled facets and the sizes"
                    + " were estimated with the main effects held fixed, so the main effects have already absorbed"
                    + " part of any interaction: sizes understate it (a planted 0.6 logit can come out near half"
                    + " that) and the chi-square is conservative. The option to estimate each combination jointly"
                    + " with the main effects (analyse --mfrm-bias-estimation joint) avoids this.");
        }
        return t.build();
    }

    private static Table biasTable(BiasPair b, String id) {
        Table.Builder t = Table.builder(id, "Bias: " + b.first() + " x " + b.second())
                .method("Bias size " + b.estimation().description() + ", by Newton-Raphson; SE from the"
                        + (b.estimation() == BiasEstimation.JOINT ? " joint information" : " cell's own information")
                        + ", t = size/SE, df = ratings - 1, two-sided p from Student's t", "Linacre 1989")
                .columns(Column.of(b.first()), Column.of(b.second()), RATINGS, OBSERVED_SCORE, EXPECTED_SCORE,
                        OBSERVED_MINUS_EXPECTED, BIAS_SIZE, STANDARD_ERROR, T_STATISTIC, DEGREES_OF_FREEDOM, P_VALUE,
                        EXTREME);
        b.cells().stream()
                .sorted(Comparator.comparingDouble((BiasCell c) -> Double.isNaN(c.t()) ? 0 : -Math.abs(c.t())))
                .forEach(c -> t.row(c.first(), c.second(), (long) c.count(), c.observedScore(), c.expectedScore(),
                        c.observedMinusExpectedAverage(), c.size(), c.se(), c.t(), (long) c.df(), c.p(),
                        c.extreme() ? "yes" : ""));
        t.note("Largest |t| first. Positive size: this combination scores higher than the main effects expect (e.g. a"
                + " rater more lenient on this task, or a condition helping this level). Extreme cells (all ratings"
                + " at one end) are estimated at a score 0.5 inwards and left out of the chi-square.");
        t.note(String.format(Locale.ROOT, "All cells: chi-square %.2f, %d degrees of freedom, p-value %s; %d cell(s)"
                + " with p-value below 0.05 (unadjusted).", b.chiSquare(), b.df(), PValueText.of(b.p()),
                b.significantCells()));
        return t.build();
    }

    private static Table unexpectedTable(MfrmResult r) {
        List<String> facets = r.model().facets();
        List<Column> cols = new ArrayList<>(List.of(RATING_NUMBER));
        facets.forEach(f -> cols.add(Column.of(f)));
        cols.addAll(List.of(SCORE, EXPECTED_SCORE, RESIDUAL, STANDARDISED_RESIDUAL));
        Table.Builder t = Table.builder("mfrm_unexpected", "Unexpected ratings")
                .method("Ratings whose standardised residual z = (observed - expected) / sqrt(variance) is large,"
                        + " largest |z| first", "Wright & Masters 1982, ch. 5")
                .columns(cols);
        for (MfrmResult.Unexpected u : r.unexpected()) {
            List<Object> row = new ArrayList<>();
            row.add((long) u.row());
            for (String f : facets) {
                row.add(u.elements().getOrDefault(f, ""));
            }
            row.add((long) u.score());
            row.addAll(List.of(u.expected(), u.residual(), u.z()));
            t.row(row.toArray());
        }
        t.note("The rating number counts ratings in input order from the first data row (blank lines not counted)."
                + " Residuals are in category units. The |z| limit (3 by default; common practice uses 2 or 3) and the"
                + " number listed are options of the analysis.");
        if (r.unexpected().isEmpty()) {
            t.note("No rating reached the limit.");
        }
        return t.build();
    }

    private static String unique(Set<String> used, String id) {
        String out = id;
        for (int i = 2; !used.add(out); i++) {
            out = id + "_" + i;
        }
        return out;
    }

    /** A name as an id or key part: lower case, runs of other characters than a-z and 0-9 as one underscore. */
    static String slug(String name) {
        String s = name.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "_").replaceAll("^_+|_+$", "");
        return s.isEmpty() ? "_" : s;
    }
}
