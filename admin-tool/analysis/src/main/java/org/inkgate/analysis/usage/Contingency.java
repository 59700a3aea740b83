package org.inkgate.analysis.usage;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.special.Gamma;

/**
 * Test of independence in an r x c table of counts: Pearson's chi-square (no continuity
 * correction), and when any expected count is below 5 (Cochran 1954, common practice) Fisher's
 * exact test by enumerating every table with the observed margins (Freeman &amp; Halton 1951):
 * p = sum of probabilities of tables no more probable than the observed one. Enumeration is
 * skipped, with a caution, beyond a fixed number of tables.
 */
public record Contingency(long[][] counts, double chiSquare, int df, double chiSquareP, double minExpected,
        double fisherP, double cramersV, String method, List<String> cautions) {

    private static final long ENUMERATION_LIMIT = 5_000_000;

    public Contingency {
        cautions = List.copyOf(cautions);
    }

    public static Contingency of(long[][] table) {
        List<String> cautions = new ArrayList<>();
        // drop empty rows and columns: they carry no information and make expected counts 0
        long[][] t = dropEmpty(table);
        int r = t.length, c = r == 0 ? 0 : t[0].length;
        if (r < 2 || c < 2) {
            cautions.add("need at least 2 non-empty rows and 2 non-empty columns (has " + r + " x " + c + ")");
            return new Contingency(table, Double.NaN, 0, Double.NaN, Double.NaN, Double.NaN, Double.NaN, "none",
                    cautions);
        }
        long[] rowSum = new long[r], colSum = new long[c];
        long n = 0;
        for (int i = 0; i < r; i++) {
            for (int j = 0; j < c; j++) {
                rowSum[i] += t[i][j];
                colSum[j] += t[i][j];
                n += t[i][j];
            }
        }
        double chi = 0, minExp = Double.POSITIVE_INFINITY;
        for (int i = 0; i < r; i++) {
            for (int j = 0; j < c; j++) {
                double e = (double) rowSum[i] * colSum[j] / n;
                minExp = Math.min(minExp, e);
                chi += (t[i][j] - e) * (t[i][j] - e) / e;
            }
        }
        int df = (r - 1) * (c - 1);
        double p = org.inkgate.analysis.distributions.Tails.chiSquareUpper(chi, df);
        double v = Math.sqrt(chi / (n * (Math.min(r, c) - 1.0)));
        double fisher = Double.NaN;
        String method = "Pearson chi-square";
        if (minExp < 5) {
            fisher = FisherExact.p(t, rowSum, colSum, n, ENUMERATION_LIMIT);
            if (Double.isNaN(fisher)) {
                cautions.add("expected count " + String.format(java.util.Locale.ROOT, "%.2f", minExp)
                        + " below 5 and the table too large for exact enumeration: chi-square p is approximate");
            } else {
                method = "Fisher exact (expected count below 5)";
            }
        }
        return new Contingency(table, chi, df, p, minExp, fisher, v, method, cautions);
    }

    /** Fisher's exact p for a table (NaN when the enumeration exceeds its limit or a margin is empty). */
    public static double fisherExact(long[][] table) {
        long[][] t = dropEmpty(table);
        if (t.length < 2 || t[0].length < 2) {
            return Double.NaN;
        }
        long[] rowSum = new long[t.length], colSum = new long[t[0].length];
        long n = 0;
        for (int i = 0; i < t.length; i++) {
            for (int j = 0; j < t[0].length; j++) {
                rowSum[i] += t[i][j];
                colSum[j] += t[i][j];
                n += t[i][j];
            }
        }
        return FisherExact.p(t, rowSum, colSum, n, ENUMERATION_LIMIT);
    }

    /** The p-value to read: Fisher's where computed, else chi-square's. */
    public double p() {
        return Double.isNaN(fisherP) ? chiSquareP : fisherP;
    }

    private static long[][] dropEmpty(long[][] table) {
        List<Integer> rows = new ArrayList<>(), cols = new ArrayList<>();
        int c = table.length == 0 ? 0 : table[0].length;
        for (int i = 0; i < table.length; i++) {
            long s = 0;
            for (long x : table[i]) {
                s += x;
            }
            if (s > 0) {
                rows.add(i);
            }
        }
        for (int j = 0; j < c; j++) {
            long s = 0;
            for (long[] row : table) {
                s += row[j];
            }
            if (s > 0) {
                cols.add(j);
            }
        }
        long[][] out = new long[rows.size()][cols.size()];
        for (int i = 0; i < rows.size(); i++) {
            for (int j = 0; j < cols.size(); j++) {
                out[i][j] = table[rows.get(i)][cols.get(j)];
            }
        }
        return out;
    }

    /** Exact conditional test by enumeration, column by column, cell by cell. */
    static final class FisherExact {
        private final long[] rowLeft;
        private final long[] colSum;
        private final double logConst;
        private final double cutoff;
        private double sum;
        private long visited;
        private final long limit;

        private FisherExact(long[] rowSum, long[] colSum, long n, double observedLog, long limit) {
            this.rowLeft = rowSum.clone();
            this.colSum = colSum;
            double lc = -logFactorial(n);
            for (long x : rowSum) {
                lc += logFactorial(x);
            }
            for (long x : colSum) {
                lc += logFactorial(x);
            }
            this.logConst = lc;
            this.cutoff = observedLog + 1e-7;
            this.limit = limit;
        }

        static double p(long[][] t, long[] rowSum, long[] colSum, long n, long limit) {
            double obs = 0;
            for (long[] row : t) {
                for (long x : row) {
                    obs -= logFactorial(x);
                }
            }
            FisherExact f = new FisherExact(rowSum, colSum, n, 0, limit);
            double observedLog = f.logConst + obs;
            FisherExact g = new FisherExact(rowSum, colSum, n, observedLog, limit);
            if (!g.walk(0, 0, colSum[0], 0)) {
                return Double.NaN;
            }
            return Math.min(1, g.sum);
        }

        /** Fills cell (i, j) given colLeft still to place in column j; false when over the limit. */
        private boolean walk(int i, int j, long colLeft, double logCells) {
            int r = rowLeft.length, c = colSum.length;
            if (j == c - 1) {
                // the last column is determined by the rows' remainders
                double lp = logCells;
                for (int k = 0; k < r; k++) {
                    lp -= logFactorial(rowLeft[k]);
                }
                double logP = logConst + lp;
                if (logP <= cutoff) {
                    sum += Math.exp(logP);
                }
                return ++visited <= limit;
            }
            if (i == r - 1) {
                if (colLeft > rowLeft[i]) {
                    return true;
                }
                rowLeft[i] -= colLeft;
                boolean ok = walk(0, j + 1, colSum[j + 1], logCells - logFactorial(colLeft));
                rowLeft[i] += colLeft;
                return ok;
            }
            long restRows = 0;
            for (int k = i + 1; k < r; k++) {
                restRows += rowLeft[k];
            }
            long min = Math.max(0, colLeft - restRows);
            long max = Math.min(colLeft, rowLeft[i]);
            for (long x = min; x <= max; x++) {
                rowLeft[i] -= x;
                boolean ok = walk(i + 1, j, colLeft - x, logCells - logFactorial(x));
                rowLeft[i] += x;
                if (!ok) {
                    return false;
                }
            }
            return true;
        }

        private static double logFactorial(long x) {
            return Gamma.logGamma(x + 1.0);
        }
    }
}
