package org.inkgate.analysis.planning;

import java.util.ArrayList;
import java.util.List;

/**
 * A D study for the crossed candidate x rater x task design: a candidate's score is the mean over
 * n_r raters and n_t tasks (Brennan 2001, Generalizability Theory, section 4.1; Shavelson &amp; Webb
 * 1991, ch. 6):
 *
 * <pre>
 * relative error  s2(delta) = s2(pr)/n_r + s2(pt)/n_t + s2(prt,e)/(n_r n_t)
 * absolute error  s2(Delta) = s2(delta) + s2(r)/n_r + s2(t)/n_t + s2(rt)/(n_r n_t)
 * generalizability coefficient  E rho^2 = s2(p) / (s2(p) + s2(delta))   (ranking candidates)
 * dependability index           Phi     = s2(p) / (s2(p) + s2(Delta))   (scores against a fixed standard)
 * </pre>
 *
 * <p>It assumes the D study keeps the G study's crossed design; raters nested within candidates
 * (each script scored by different raters) move the rater variance into the relative error too.
 */
public record DecisionStudy(int raters, int tasks, double relativeError, double absoluteError,
        double generalizability, double dependability) {

    public static DecisionStudy of(VarianceComponents v, int raters, int tasks) {
        if (raters < 1 || tasks < 1) {
            throw new IllegalArgumentException("a D study needs at least 1 rater and 1 task: " + raters + " raters, "
                    + tasks + " tasks");
        }
        double nr = raters;
        double nt = tasks;
        double relative = v.candidateRater() / nr + v.candidateTask() / nt + v.residual() / (nr * nt);
        double absolute = relative + v.rater() / nr + v.task() / nt + v.raterTask() / (nr * nt);
        return new DecisionStudy(raters, tasks, relative, absolute, v.candidate() / (v.candidate() + relative),
                v.candidate() / (v.candidate() + absolute));
    }

    /** One D study per combination, raters varying fastest within each number of tasks. */
    public static List<DecisionStudy> table(VarianceComponents v, int[] raters, int[] tasks) {
        List<DecisionStudy> out = new ArrayList<>();
        for (int t : tasks) {
            for (int r : raters) {
                out.add(of(v, r, t));
            }
        }
        return out;
    }
}
