package org.inkgate.analysis.mfrm.fit;

/**
 * Standardising fit mean-squares by the Wilson-Hilferty cube-root transformation, as given by
 * Wright & Masters (1982, pp. 100-101): t = (MnSq^(1/3) - 1)(3/q) + q/3, where q is the model
 * standard deviation of the mean-square.
 */
public final class MeanSquares {
    private MeanSquares() {
    }

    /** Standardised value of a mean-square with model standard deviation q; NaN when q is not positive. */
    public static double standardise(double meanSquare, double q) {
        if (!(q > 0) || !(meanSquare >= 0)) {
            return Double.NaN;
        }
        return (Math.cbrt(meanSquare) - 1) * (3 / q) + q / 3;
    }

    /**
     * q of the outfit (unweighted) mean-square: q^2 = sum(C/W^2)/N^2 - 1/N, with W the model
     * variance and C the fourth central moment of each rating (Wright & Masters 1982, p. 100).
     */
    public static double outfitQ(double sumCOverW2, double n) {
        double q2 = sumCOverW2 / (n * n) - 1 / n;
        return q2 > 0 ? Math.sqrt(q2) : Double.NaN;
    }

    /** q of the infit (information-weighted) mean-square: q^2 = sum(C - W^2) / (sum W)^2 (ibid.). */
    public static double infitQ(double sumCMinusW2, double sumW) {
        double q2 = sumCMinusW2 / (sumW * sumW);
        return q2 > 0 ? Math.sqrt(q2) : Double.NaN;
    }
}
