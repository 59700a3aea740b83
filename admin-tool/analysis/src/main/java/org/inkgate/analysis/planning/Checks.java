package org.inkgate.analysis.planning;

/** Argument checks with messages that say which figure is wrong and what it must be. */
final class Checks {

    private Checks() {
    }

    static double alpha(double alpha) {
        if (!(alpha > 0 && alpha < 1)) {
            throw new IllegalArgumentException("the significance level (alpha) must be between 0 and 1, e.g. 0.05: " + alpha);
        }
        return alpha;
    }

    static double power(double power) {
        if (!(power > 0 && power < 1)) {
            throw new IllegalArgumentException("the power wanted must be between 0 and 1, e.g. 0.8: " + power);
        }
        return power;
    }

    static double finite(String what, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(what + " must be a number: " + value);
        }
        return value;
    }

    static double positive(String what, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(what + " must be above 0: " + value);
        }
        return value;
    }

    static double correlation(double rho) {
        if (!(rho > -1 && rho < 1)) {
            throw new IllegalArgumentException("the correlation between a candidate's scores must be above -1 and below 1: " + rho);
        }
        return rho;
    }
}
