package org.inkgate.analysis.planning;

/** Conversions between the ways a test owner may state the effect to plan for. */
public final class Effects {

    private Effects() {
    }

    /**
     * d_z for the paired design from d (the mean difference over one condition's standard deviation)
     * and the correlation rho between a candidate's two scores, assuming equal standard deviations:
     * the difference of two scores has variance 2 sigma^2 (1 - rho), so d_z = d / sqrt(2 (1 - rho))
     * (an identity; Cohen 1988, section 2.3, states the same conversion).
     */
    public static double ofDifferences(double d, double rho) {
        Checks.finite("the effect", d);
        Checks.correlation(rho);
        return d / Math.sqrt(2 * (1 - rho));
    }

    /**
     * d from a difference in Rasch logits and the standard deviation of candidates' measures in
     * logits (the test owner states it, e.g. from a pilot's many-facet Rasch analysis): a logit
     * difference means as many standard deviations as it is a fraction of that SD.
     */
    public static double fromLogits(double logitDifference, double candidateSdLogits) {
        Checks.finite("the logit difference", logitDifference);
        Checks.positive("the standard deviation of candidate measures in logits", candidateSdLogits);
        return logitDifference / candidateSdLogits;
    }

    /**
     * Cohen's f from the condition means planned and the common within-condition standard
     * deviation: the standard deviation of the means (divisor k) over sigma (Cohen 1988, ch. 8).
     */
    public static double cohensF(double[] means, double sd) {
        if (means.length < 2) {
            throw new IllegalArgumentException("Cohen's f needs the means of 2 or more conditions");
        }
        Checks.positive("the standard deviation", sd);
        double mean = 0;
        for (double m : means) {
            mean += Checks.finite("a condition mean", m) / means.length;
        }
        double ss = 0;
        for (double m : means) {
            ss += (m - mean) * (m - mean);
        }
        return Math.sqrt(ss / means.length) / sd;
    }
}
