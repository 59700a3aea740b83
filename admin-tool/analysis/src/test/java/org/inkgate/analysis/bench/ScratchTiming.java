package org.inkgate.analysis.bench;

import org.inkgate.analysis.distributions.StudentizedRange;
import org.inkgate.analysis.distributions.NoncentralT;

public class ScratchTiming {
    public static void main(String[] a) throws Exception {
        for (int rep = 0; rep < 3; rep++) {
            long t0 = System.nanoTime();
            for (int i = 0; i < 10; i++) StudentizedRange.quantile(0.95, 3, 10 + i);
            long t1 = System.nanoTime();
            for (int i = 0; i < 10; i++) StudentizedRange.cdf(3.5, 3, 12 + i);
            long t2 = System.nanoTime();
            for (int i = 0; i < 10; i++) NoncentralT.deltaInterval(2.5, 9 + i, 0.95);
            long t3 = System.nanoTime();
            System.out.printf("10 q %.1f ms, 10 cdf %.1f ms, 10 nct CI %.1f ms%n", (t1-t0)/1e6, (t2-t1)/1e6, (t3-t2)/1e6);
        }
        long t0 = System.nanoTime();
        var ratings = org.inkgate.analysis.testutil.SimulatedSitting.ratings(Integer.getInteger("n", 300), 7);
        var scores = org.inkgate.analysis.scores.ScoreTable.of(ratings, org.inkgate.analysis.scores.ScoreRule.MEAN, null);
        long t1 = System.nanoTime();
        var rep = org.inkgate.analysis.study.StudyAnalysis.report(org.inkgate.analysis.study.StudyData.ofRatings(ratings), org.inkgate.analysis.study.StudyOptions.DEFAULT);
        long t2 = System.nanoTime();
        org.inkgate.analysis.report.ReportWriter.write(rep, java.nio.file.Path.of("/tmp/an-demo"));
        long t3 = System.nanoTime();
        System.out.printf("scores %.1f ms, analysis %.1f ms, write %.1f ms%n", (t1-t0)/1e6, (t2-t1)/1e6, (t3-t2)/1e6);
    }
}
