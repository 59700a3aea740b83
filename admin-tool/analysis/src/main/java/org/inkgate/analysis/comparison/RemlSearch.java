package org.inkgate.analysis.comparison;

import java.util.Arrays;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.optim.InitialGuess;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.SimpleBounds;
import org.apache.commons.math3.optim.SimpleValueChecker;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.nonlinear.scalar.ObjectiveFunction;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.BOBYQAOptimizer;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.NelderMeadSimplex;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.SimplexOptimizer;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;

/**
 * Minimises the profiled REML criterion over the relative standard deviations theta >= 0.
 *
 * <p>BOBYQA from theta = 1 (lme4's start), then a short restart that polishes its optimum. Commons
 * Math's BOBYQA can stop with "trust region step has failed to reduce Q" when a variance sits at
 * or near zero (about 1 fit in 80 on small noise-only data sets, see LinearMixedModelRobustnessTest);
 * the search therefore keeps the best point it has evaluated, and when BOBYQA fails it goes on with
 * a Nelder-Mead simplex over |t| (the criterion depends on theta only through its square, so the
 * bound needs no constraint there) before polishing again. An optimiser's failure never reaches the
 * report: only the best point found does.
 */
final class RemlSearch {

    private final ProfiledReml reml;
    private final int dims;
    private double[] bestPoint;
    private double bestValue = Double.POSITIVE_INFINITY;
    private int evaluations;
    private boolean fellBack;

    private RemlSearch(ProfiledReml reml, int dims) {
        this.reml = reml;
        this.dims = dims;
    }

    /** The result: theta at the smallest criterion found, how many evaluations it took, and whether BOBYQA failed. */
    record Result(double[] theta, int evaluations, boolean fellBack) {
    }

    static Result minimise(ProfiledReml reml, int dims) {
        RemlSearch s = new RemlSearch(reml, dims);
        if (dims == 1) {
            s.brent();
        } else {
            s.bobyqaWithFallback();
        }
        return new Result(s.bestPoint.clone(), s.evaluations, s.fellBack);
    }

    private double value(double[] theta) {
        evaluations++;
        double v = reml.criterion(theta);
        if (v < bestValue) {
            bestValue = v;
            bestPoint = theta.clone();
        }
        return Double.isNaN(v) ? Double.POSITIVE_INFINITY : v;
    }

    /** BOBYQA needs two or more parameters; one relative SD is searched by Brent's method. */
    private void brent() {
        UnivariateFunction f = t -> value(new double[] {t});
        value(new double[] {1});
        new BrentOptimizer(1e-12, 1e-12).optimize(new MaxEval(10_000), new UnivariateObjectiveFunction(f),
                GoalType.MINIMIZE, new SearchInterval(0, 100, 1));
    }

    private void bobyqaWithFallback() {
        double[] start = new double[dims];
        Arrays.fill(start, 1);
        value(start);
        // a first search to lme4's usual precision, then a short restart that polishes the optimum
        if (!bobyqa(start, 0.2, 1e-7)) {
            fellBack = true;
            simplex(bestPoint.clone());
        }
        bobyqa(bestPoint.clone(), 1e-4, 1e-10);
    }

    /** One BOBYQA run; false when it stopped on a failed trust-region step or ran out of evaluations. */
    private boolean bobyqa(double[] from, double initialRadius, double stoppingRadius) {
        double[] lower = new double[dims];
        double[] upper = new double[dims];
        Arrays.fill(upper, 1e4);
        try {
            new BOBYQAOptimizer(2 * dims + 1, initialRadius, stoppingRadius).optimize(new MaxEval(100_000),
                    new ObjectiveFunction(this::value), GoalType.MINIMIZE, new InitialGuess(from),
                    new SimpleBounds(lower, upper));
            return true;
        } catch (MathIllegalStateException e) { // includes running out of evaluations
            return false;
        }
    }

    private void simplex(double[] from) {
        try {
            new SimplexOptimizer(new SimpleValueChecker(1e-12, 1e-12)).optimize(new MaxEval(100_000),
                    new ObjectiveFunction(t -> value(abs(t))), GoalType.MINIMIZE, new InitialGuess(from),
                    new NelderMeadSimplex(dims, 0.1));
        } catch (TooManyEvaluationsException e) {
            // the best point evaluated so far stands; the polish that follows starts from it
        }
    }

    private static double[] abs(double[] t) {
        double[] a = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            a[i] = Math.abs(t[i]);
        }
        return a;
    }
}
