package org.eddycast.forecast;

import java.util.function.DoubleUnaryOperator;

import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;

/** Composite Gauss-Legendre quadrature for tests (Commons Math rules on equal panels). */
final class Quadrature {

    private static final GaussIntegratorFactory FACTORY = new GaussIntegratorFactory();

    private Quadrature() {
    }

    static double integrate(DoubleUnaryOperator f, double lower, double upper, int panels) {
        double h = (upper - lower) / panels;
        double sum = 0.0;
        for (int i = 0; i < panels; i++) {
            GaussIntegrator rule = FACTORY.legendre(10, lower + i * h, lower + (i + 1) * h);
            sum += rule.integrate(f::applyAsDouble);
        }
        return sum;
    }
}
