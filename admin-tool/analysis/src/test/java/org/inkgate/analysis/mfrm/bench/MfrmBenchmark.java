package org.inkgate.analysis.mfrm.bench;

import java.io.PrintStream;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.inkgate.analysis.mfrm.ManyFacetRasch;
import org.inkgate.analysis.mfrm.MfrmOptions;
import org.inkgate.analysis.mfrm.MfrmResult;
import org.inkgate.analysis.mfrm.RatingData;
import org.inkgate.analysis.mfrm.ReferenceFits;
import org.inkgate.analysis.mfrm.Simulation;

/**
 * Bench command (not a test): {@code mvn -q -Pbench -pl admin-tool/analysis -am process-test-classes}.
 * 1. the large design: 1,000,000 simulated ratings (50,000 candidates, 2 tasks, 2
 *    conditions, 20 raters, 5 criteria, 9 categories), timed from coded data to a full result
 *    (design check, estimation to convergence, SEs, fit, categories), median of 5 runs after one
 *    warm-up, peak heap used;
 * 2. side by side with R VGAM on the committed 2,000- and 6,000-rating sets (R timings from
 *    src/test/resources/mfrm/reference/vgam-timings.csv).
 */
public final class MfrmBenchmark {
    private MfrmBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        PrintStream out = new PrintStream(System.out, true, StandardCharsets.UTF_8);
        int candidates = args.length > 0 ? Integer.parseInt(args[0]) : 50_000;
        int runs = args.length > 1 ? Integer.parseInt(args[1]) : 5;
        out.println("uptime: " + new String(new ProcessBuilder("uptime").start().getInputStream().readAllBytes(),
                StandardCharsets.UTF_8).trim());
        out.println("cores " + Runtime.getRuntime().availableProcessors() + ", max heap "
                + Runtime.getRuntime().maxMemory() / (1 << 20) + " MiB");
        Simulation sim = Simulation.writingExam(2026, candidates);
        out.println("simulated " + sim.data().size() + " ratings");
        MfrmOptions options = MfrmOptions.builder(sim.facets()).build();
        System.gc();
        long[] ms = new long[runs];
        long peak = 0;
        MfrmResult r = ManyFacetRasch.analyse(sim.data(), options); // warm-up
        for (int i = 0; i < runs; i++) {
            System.gc();
            resetPeaks();
            long t0 = System.nanoTime();
            r = ManyFacetRasch.analyse(sim.data(), options);
            ms[i] = (System.nanoTime() - t0) / 1_000_000;
            peak = Math.max(peak, peakHeap());
        }
        out.printf(Locale.ROOT, "large: %d ratings, runs %s ms, median %d ms, iterations %d, converged %s,"
                        + " peak heap used %d MiB (data set included)%n", sim.data().size(), Arrays.toString(ms),
                median(ms), r.convergence().iterations(), r.convergence().converged(), peak / (1 << 20));
        double worst = 0;
        for (int f = 0; f < sim.facets().size(); f++) {
            for (MfrmResult.Element e : r.facet(sim.facets().get(f)).elements()) {
                worst = Math.max(worst, Math.abs(e.measure() - sim.truthOf(f, e.label())));
            }
        }
        out.printf(Locale.ROOT, "large: largest |estimate - truth| over task, condition, rater, criterion %.4f%n", worst);

        Map<String, Double> rSeconds = vgamMedians();
        for (String name : List.of("ratingscale-2000", "ratingscale-6000")) {
            RatingData data = ReferenceFits.data(name);
            MfrmOptions o = MfrmOptions.builder(List.of("task", "rater")).build();
            for (int i = 0; i < 20; i++) {
                ManyFacetRasch.analyse(data, o);
            }
            long[] t = new long[21];
            MfrmResult res = null;
            for (int i = 0; i < t.length; i++) {
                long t0 = System.nanoTime();
                res = ManyFacetRasch.analyse(data, o);
                t[i] = (System.nanoTime() - t0) / 1000;
            }
            double diff = ReferenceFits.compare(res, ReferenceFits.measures(name + "-vgam.csv"),
                    List.of("candidate", "task", "rater"));
            double javaMs = median(t) / 1000.0;
            double rMs = rSeconds.get(name) * 1000;
            out.printf(Locale.ROOT, "vs VGAM %s: %d ratings, Java median %.1f ms, R vglm median %.0f ms,"
                    + " ratio R/Java %.0f, largest |difference| in measures %.2e logits%n", name, data.size(), javaMs,
                    rMs, rMs / javaMs, diff);
        }
    }

    private static Map<String, Double> vgamMedians() throws Exception {
        try (var in = MfrmBenchmark.class.getResourceAsStream("/mfrm/reference/vgam-timings.csv")) {
            List<String> lines = new String(in.readAllBytes(), StandardCharsets.UTF_8).lines().toList();
            Map<String, Double> m = new java.util.HashMap<>();
            for (String l : lines.subList(1, lines.size())) {
                String[] f = l.split(",");
                m.put(f[0], Double.parseDouble(f[2]));
            }
            return m;
        }
    }

    private static void resetPeaks() {
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
            if (p.getType() == MemoryType.HEAP) {
                p.resetPeakUsage();
            }
        }
    }

    private static long peakHeap() {
        long sum = 0;
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
            if (p.getType() == MemoryType.HEAP) {
                sum += p.getPeakUsage().getUsed();
            }
        }
        return sum;
    }

    private static long median(long[] v) {
        long[] s = v.clone();
        Arrays.sort(s);
        return s[s.length / 2];
    }
}
