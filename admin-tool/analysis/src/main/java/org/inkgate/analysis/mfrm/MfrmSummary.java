package org.inkgate.analysis.mfrm;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.analysis.mfrm.bias.BiasCell;
import org.inkgate.analysis.mfrm.bias.BiasPair;
import org.inkgate.analysis.mfrm.fit.Separation;

/**
 * The result as nested maps and lists with stable keys, ready for JSON. Numbers that are
 * undefined (NaN, infinite) become null. Bias cells are listed largest |t| first, at most
 * {@link #BIAS_CELLS_LISTED} per pair (the counts and chi-square cover all of them).
 */
final class MfrmSummary {
    static final int BIAS_CELLS_LISTED = 50;

    private MfrmSummary() {
    }

    static Map<String, Object> of(MfrmResult r) {
        Map<String, Object> out = new LinkedHashMap<>();
        Map<String, Object> model = new LinkedHashMap<>();
        model.put("facets", r.model().facets());
        model.put("structure", r.model().structure());
        model.put("ratings", r.model().ratings());
        model.put("ratingsEstimated", r.model().ratingsEstimated());
        model.put("lengthCorrection", r.model().lengthCorrection());
        model.put("lengthCorrectionFactor", num(r.model().lengthCorrectionFactor()));
        model.put("notes", r.model().notes());
        out.put("model", model);
        Map<String, Object> conv = new LinkedHashMap<>();
        conv.put("converged", r.convergence().converged());
        conv.put("iterations", r.convergence().iterations());
        conv.put("maxIterations", r.convergence().maxIterations());
        conv.put("maxScoreResidual", num(r.convergence().maxScoreResidual()));
        conv.put("maxLogitChange", num(r.convergence().maxLogitChange()));
        conv.put("residualLimit", num(r.convergence().residualLimit()));
        conv.put("changeLimit", num(r.convergence().changeLimit()));
        out.put("convergence", conv);
        List<Object> facets = new ArrayList<>();
        for (MfrmResult.Facet f : r.facets()) {
            Map<String, Object> fm = new LinkedHashMap<>();
            fm.put("name", f.name());
            fm.put("summary", separation(f.separation()));
            fm.put("summaryJointSe", f.separationJointSe() == null ? null : separation(f.separationJointSe()));
            List<Object> els = new ArrayList<>();
            for (MfrmResult.Element e : f.elements()) {
                Map<String, Object> em = new LinkedHashMap<>();
                em.put("label", e.label());
                em.put("status", e.status().name().toLowerCase(java.util.Locale.ROOT));
                em.put("measure", num(e.measure()));
                em.put("se", num(e.se()));
                em.put("jointSe", num(e.jointSe()));
                em.put("count", e.count());
                em.put("observedScore", num(e.observedScore()));
                em.put("expectedScore", num(e.expectedScore()));
                em.put("observedAverage", num(e.observedAverage()));
                em.put("infit", num(e.infit()));
                em.put("infitZ", num(e.infitZ()));
                em.put("outfit", num(e.outfit()));
                em.put("outfitZ", num(e.outfitZ()));
                em.put("pointMeasure", num(e.pointMeasure()));
                em.put("displacement", num(e.displacement()));
                em.put("adjustedScore", num(e.adjustedScore()));
                em.put("adjustedScoreLow", num(e.adjustedLow()));
                em.put("adjustedScoreHigh", num(e.adjustedHigh()));
                els.add(em);
            }
            fm.put("elements", els);
            facets.add(fm);
        }
        out.put("facets", facets);
        List<Object> scales = new ArrayList<>();
        for (MfrmResult.Scale s : r.scales()) {
            Map<String, Object> sm = new LinkedHashMap<>();
            sm.put("label", s.label());
            List<Object> cats = new ArrayList<>();
            for (MfrmResult.Category c : s.categories()) {
                Map<String, Object> cm = new LinkedHashMap<>();
                cm.put("score", c.score());
                cm.put("count", c.count());
                cm.put("percent", num(c.percent()));
                cm.put("averageMeasure", num(c.averageMeasure()));
                cm.put("expectedAverageMeasure", num(c.expectedAverageMeasure()));
                cm.put("outfit", num(c.outfit()));
                cm.put("threshold", num(c.threshold()));
                cm.put("thresholdSe", num(c.thresholdSe()));
                cm.put("thresholdJointSe", num(c.thresholdJointSe()));
                cats.add(cm);
            }
            sm.put("categories", cats);
            sm.put("notes", s.notes());
            scales.add(sm);
        }
        out.put("scales", scales);
        List<Object> unexpected = new ArrayList<>();
        for (MfrmResult.Unexpected u : r.unexpected()) {
            Map<String, Object> um = new LinkedHashMap<>();
            um.put("row", u.row());
            um.put("elements", u.elements());
            um.put("score", u.score());
            um.put("expected", num(u.expected()));
            um.put("residual", num(u.residual()));
            um.put("z", num(u.z()));
            unexpected.add(um);
        }
        out.put("unexpected", unexpected);
        List<Object> bias = new ArrayList<>();
        for (BiasPair b : r.bias()) {
            Map<String, Object> bm = new LinkedHashMap<>();
            bm.put("first", b.first());
            bm.put("second", b.second());
            bm.put("cellCount", b.cells().size());
            bm.put("chiSquare", num(b.chiSquare()));
            bm.put("df", b.df());
            bm.put("p", num(b.p()));
            bm.put("significantCells", b.significantCells());
            bm.put("estimation", b.estimation().option());
            bm.put("notEstimable", b.notEstimable());
            List<Object> cells = new ArrayList<>();
            b.cells().stream()
                    .sorted(Comparator.comparingDouble((BiasCell c) -> -Math.abs(Double.isNaN(c.t()) ? 0 : c.t())))
                    .limit(BIAS_CELLS_LISTED)
                    .forEach(c -> {
                        Map<String, Object> cm = new LinkedHashMap<>();
                        cm.put("first", c.first());
                        cm.put("second", c.second());
                        cm.put("count", c.count());
                        cm.put("observedScore", num(c.observedScore()));
                        cm.put("expectedScore", num(c.expectedScore()));
                        cm.put("observedMinusExpectedAverage", num(c.observedMinusExpectedAverage()));
                        cm.put("size", num(c.size()));
                        cm.put("se", num(c.se()));
                        cm.put("t", num(c.t()));
                        cm.put("df", c.df());
                        cm.put("p", num(c.p()));
                        cm.put("extreme", c.extreme());
                        cells.add(cm);
                    });
            bm.put("cells", cells);
            bias.add(bm);
        }
        out.put("bias", bias);
        out.put("warnings", r.warnings());
        return out;
    }

    private static Map<String, Object> separation(Separation s) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("count", s.count());
        m.put("mean", num(s.mean()));
        m.put("sd", num(s.sd()));
        m.put("rmse", num(s.rmse()));
        m.put("trueSd", num(s.trueSd()));
        m.put("separation", num(s.separation()));
        m.put("reliability", num(s.reliability()));
        m.put("strata", num(s.strata()));
        m.put("chiSquare", num(s.chiSquare()));
        m.put("df", s.df());
        m.put("p", num(s.p()));
        return m;
    }

    private static Double num(double v) {
        return Double.isFinite(v) ? v : null;
    }
}
