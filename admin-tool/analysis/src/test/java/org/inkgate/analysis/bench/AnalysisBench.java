package org.inkgate.analysis.bench;

import java.io.IOException;
import java.io.PrintStream;
import java.io.Reader;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.inkgate.analysis.data.RatingsReader;
import org.inkgate.analysis.report.ReportWriter;
import org.inkgate.analysis.study.StudyAnalysis;
import org.inkgate.analysis.study.StudyData;
import org.inkgate.analysis.study.StudyOptions;
import org.inkgate.analysis.testutil.SimulatedSitting;

/**
 * Bench command (profile -Pbench): the whole analysis of 50,000 simulated candidates x 2 tasks x
 * 2 raters x 5 criteria = 1,000,000 ratings, from reading the CSV to the written report, run
 * several times; prints each run, the median and the peak heap (sum of the heap pools' peaks).
 * Not a test: its figures go to docs/benchmarks.md.
 */
public final class AnalysisBench {

    private AnalysisBench() {
    }

    public static void main(String[] args) throws Exception {
        PrintStream out = System.out;
        Path dir = Path.of(args.length > 0 ? args[0] : "target/analysis-bench");
        int candidates = Integer.getInteger("bench.candidates", 50_000);
        int runs = Integer.getInteger("bench.runs", 5);
        Files.createDirectories(dir);
        Path csv = dir.resolve("ratings.csv");
        SimulatedSitting.writeCsv(SimulatedSitting.ratings(candidates, 2026), csv);
        out.printf("ratings file: %s (%.1f MB)%n", csv, Files.size(csv) / 1e6);
        List<Double> seconds = new ArrayList<>();
        for (int r = 0; r < runs + 1; r++) {
            System.gc();
            resetPeaks();
            long t0 = System.nanoTime();
            runOnce(csv, dir.resolve("report"));
            double s = (System.nanoTime() - t0) / 1e9;
            long peak = peakHeap();
            if (r == 0) {
                out.printf("warm-up run: %.2f s, peak heap %.0f MiB%n", s, peak / 1048576.0);
            } else {
                seconds.add(s);
                out.printf("run %d: %.2f s, peak heap %.0f MiB%n", r, s, peak / 1048576.0);
            }
        }
        Collections.sort(seconds);
        out.printf("median of %d runs: %.2f s (read CSV, analyse, write report)%n", runs, seconds.get(seconds.size() / 2));
    }

    static void runOnce(Path csv, Path reportDir) throws Exception {
        var bean = (com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean();
        long c0 = bean.getProcessCpuTime(), w0 = System.nanoTime();
        try (Reader in = Files.newBufferedReader(csv, StandardCharsets.UTF_8)) {
            var ratings = RatingsReader.read(csv.getFileName().toString(), in);
            long c1 = bean.getProcessCpuTime(), w1 = System.nanoTime();
            var report = StudyAnalysis.report(StudyData.ofRatings(ratings), StudyOptions.DEFAULT);
            long c2 = bean.getProcessCpuTime(), w2 = System.nanoTime();
            ReportWriter.write(report, reportDir);
            long c3 = bean.getProcessCpuTime(), w3 = System.nanoTime();
            System.out.printf("  read %.2f s (cpu %.2f), analyse %.2f s (cpu %.2f), write %.2f s (cpu %.2f)%n",
                    (w1 - w0) / 1e9, (c1 - c0) / 1e9, (w2 - w1) / 1e9, (c2 - c1) / 1e9, (w3 - w2) / 1e9, (c3 - c2) / 1e9);
        }
    }

    private static void resetPeaks() {
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
            if (p.getType() == MemoryType.HEAP) {
                p.resetPeakUsage();
            }
        }
    }

    private static long peakHeap() throws IOException {
        long sum = 0;
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
            if (p.getType() == MemoryType.HEAP) {
                sum += p.getPeakUsage().getUsed();
            }
        }
        return sum;
    }
}
