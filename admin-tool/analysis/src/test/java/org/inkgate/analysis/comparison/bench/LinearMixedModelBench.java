package org.inkgate.analysis.comparison.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import org.inkgate.analysis.comparison.LinearMixedModel;

/**
 * Bench command (not JMH: one fit takes from tenths of a second to seconds, and what matters is the
 * whole fit from ratings to result): the linear mixed model on SIMULATED (seeded, invented)
 * within-candidate studies of 10,000 and 100,000 ratings. Each candidate writes under three
 * conditions, one task per condition rotated over 6 tasks; each response is scored by 2 of 40
 * raters. One warm-up, then 5 timed fits; prints the median, the runs, the REML evaluations, the
 * peak heap and the load average before and after.
 *
 * <p>Run: {@code java -Xmx2g -cp <test classpath> org.inkgate.analysis.comparison.bench.LinearMixedModelBench}
 * or with the bench profile (docs/benchmarks.md).
 */
public final class LinearMixedModelBench {

    private static final java.lang.management.ThreadMXBean THREADS = ManagementFactory.getThreadMXBean();
    private static final List<String> CONDITIONS = List.of("none", "spelling", "full");

    private LinearMixedModelBench() {
    }

    record Study(double[] score, String[] condition, Map<String, String[]> factors) {
    }

    static Study simulate(int ratings, long seed) {
        Random rnd = new Random(seed);
        int candidates = ratings / 6;
        double[] rater = new double[40], task = new double[6];
        Arrays.setAll(rater, i -> 0.4 * rnd.nextGaussian());
        Arrays.setAll(task, i -> 0.3 * rnd.nextGaussian());
        double[] effect = {0, 0.1, 0.4};
        int n = candidates * 6;
        double[] y = new double[n];
        String[] cond = new String[n], c = new String[n], r = new String[n], t = new String[n];
        int row = 0;
        for (int i = 0; i < candidates; i++) {
            double ability = rnd.nextGaussian();
            String id = "C" + i;
            for (int j = 0; j < 3; j++) {
                int k = (i + 2 * j) % 6;
                int r1 = rnd.nextInt(40), r2 = (r1 + 1 + rnd.nextInt(39)) % 40;
                for (int q : new int[] {r1, r2}) {
                    y[row] = Math.round(2 * (5 + effect[j] + ability + rater[q] + task[k]
                            + 0.8 * rnd.nextGaussian())) / 2.0;
                    cond[row] = CONDITIONS.get(j);
                    c[row] = id;
                    r[row] = "R" + q;
                    t[row] = "T" + k;
                    row++;
                }
            }
        }
        Map<String, String[]> f = new LinkedHashMap<>();
        f.put("candidate", c);
        f.put("rater", r);
        f.put("task", t);
        return new Study(y, cond, f);
    }

    public static void main(String[] args) {
        System.out.println("load before: " + load());
        for (int size : new int[] {10_000, 100_000}) {
            Study s = simulate(size, 20261203L + size);
            LinearMixedModel.fit(s.score(), s.condition(), CONDITIONS, s.factors(), 0.95); // warm-up
            double[] ms = new double[5];
            double[] cpu = new double[5];
            LinearMixedModel last = null;
            long peak = 0;
            for (int i = 0; i < ms.length; i++) {
                resetPeaks();
                long t0 = System.nanoTime();
                long c0 = THREADS.getCurrentThreadCpuTime();
                last = LinearMixedModel.fit(s.score(), s.condition(), CONDITIONS, s.factors(), 0.95);
                ms[i] = (System.nanoTime() - t0) / 1e6;
                cpu[i] = (THREADS.getCurrentThreadCpuTime() - c0) / 1e6;
                peak = Math.max(peak, peakHeap());
            }
            double[] sorted = ms.clone();
            Arrays.sort(sorted);
            double[] cpuSorted = cpu.clone();
            Arrays.sort(cpuSorted);
            List<String> runs = new ArrayList<>();
            for (double m : ms) {
                runs.add(String.format(Locale.ROOT, "%.0f", m));
            }
            System.out.printf(Locale.ROOT, "%,d ratings (%,d candidates, 40 raters, 6 tasks, 3 conditions):"
                    + " median %.0f ms wall, %.0f ms CPU of the fitting thread; runs %s ms; %d REML evaluations; peak heap %d MiB; full minus none %.4f"
                    + " (planted 0.4)%n", s.score().length, s.score().length / 6, sorted[2], cpuSorted[2], String.join(", ", runs),
                    last.evaluations(), peak >> 20, last.effectOf("full").estimate());
        }
        System.out.println("load after: " + load());
    }

    private static String load() {
        return String.format(Locale.ROOT, "%.2f (1-minute load average, %d processors)",
                ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage(),
                Runtime.getRuntime().availableProcessors());
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
            if (p.getType() == MemoryType.HEAP && p.getPeakUsage() != null) {
                sum += p.getPeakUsage().getUsed();
            }
        }
        return sum;
    }
}
