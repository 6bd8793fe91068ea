package org.eddycast.propagation;

import org.eddycast.scenario.InputRange;
import org.eddycast.uncertainty.InputDistribution;
import org.eddycast.uncertainty.LogNormalRange;
import org.eddycast.uncertainty.NormalRange;
import org.eddycast.uncertainty.TriangularRange;
import org.eddycast.uncertainty.UniformRange;

/** Turns a range as the user gave it into a distribution. */
final class InputDistributions {

    private InputDistributions() {
    }

    /**
     * The range's distribution; a plus-or-minus fraction is read as uniform about the scenario's value (the
     * least-informed reading of a stated tolerance: common practice).
     *
     * @param nominal the input's value in the scenario
     */
    static InputDistribution of(InputRange r, double nominal) {
        return switch (r.shape()) {
            case PLUS_MINUS -> new UniformRange(Math.min(nominal * (1 - r.a()), nominal * (1 + r.a())),
                    Math.max(nominal * (1 - r.a()), nominal * (1 + r.a())));
            case UNIFORM -> new UniformRange(r.a(), r.b());
            case TRIANGULAR -> new TriangularRange(r.a(), r.b(), r.c());
            case NORMAL -> new NormalRange(r.a(), r.b());
            case LOG_NORMAL -> new LogNormalRange(r.a(), r.b());
            case RULE -> throw new IllegalArgumentException("a rule's spread is resolved before this");
        };
    }
}
