package org.eddycast.forecast;

import java.util.function.DoubleUnaryOperator;

import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;

/**
 * The maximum of a function known to be unimodal on a closed interval, by Brent's method (Brent 1973,
 * Algorithms for Minimization without Derivatives, Prentice-Hall, ch. 5) through Commons Math, with both ends
 * checked as well because Brent's method only visits interior points.
 */
final class UnimodalMaximum {

    private UnimodalMaximum() {
    }

    static double of(DoubleUnaryOperator f, double lower, double upper, double start) {
        double atEnds = Math.max(f.applyAsDouble(lower), f.applyAsDouble(upper));
        if (!(upper > lower)) {
            return atEnds;
        }
        BrentOptimizer optimizer = new BrentOptimizer(1e-12, 1e-14 * Math.max(1.0, Math.abs(upper - lower)));
        double inside = optimizer.optimize(new MaxEval(500), GoalType.MAXIMIZE,
                new UnivariateObjectiveFunction(f::applyAsDouble),
                new SearchInterval(lower, upper, Math.min(upper, Math.max(lower, start)))).getValue();
        return Math.max(inside, atEnds);
    }
}
