package org.inkgate.analysis.distributions;

import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;

/** 20-point Gauss-Legendre quadrature on one interval (nodes from Commons Math). */
final class GaussLegendre {

    static final int POINTS = 20;
    private static final double[] NODES;
    private static final double[] WEIGHTS;

    static {
        GaussIntegrator rule = new GaussIntegratorFactory().legendre(POINTS);
        NODES = new double[POINTS];
        WEIGHTS = new double[POINTS];
        for (int i = 0; i < POINTS; i++) {
            NODES[i] = rule.getPoint(i);
            WEIGHTS[i] = rule.getWeight(i);
        }
    }

    private GaussLegendre() {
    }

    static double node(int i) {
        return NODES[i];
    }

    static double weight(int i) {
        return WEIGHTS[i];
    }

    static double integrate(DoubleUnaryOperator f, double a, double b) {
        double half = (b - a) / 2;
        double mid = (a + b) / 2;
        double sum = 0;
        for (int i = 0; i < POINTS; i++) {
            sum += WEIGHTS[i] * f.applyAsDouble(mid + half * NODES[i]);
        }
        return sum * half;
    }
}
