package org.eddycast.engine;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.stream.Stream;
import org.eddycast.docs.ValidationLog;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every built-in verification case against its exact or published value (sources in each case's
 * {@link VerificationCase#source()}: Taylor 1921, Proc. London Math. Soc. s2-20:196 for the shears and the
 * uniform Ornstein-Uhlenbeck velocity; the cell problem of the cellular flow, after Shraiman 1987, Phys. Rev. A
 * 36:261, and Rosenbluth et al. 1987, Phys. Fluids 30:2636). Pass: within three standard errors (over
 * independent blocks) plus the stated bias bound, and a 95% interval no wider than 3% of the value. The seed
 * {@link VerificationSuite#SEED} was fixed before any outcome was seen.
 */
class VerificationSuiteTest {

    static Stream<VerificationCase> cases() {
        return VerificationSuite.cases().stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void reproducesTheKnownDiffusivity(VerificationCase c) {
        VerificationSuite.Outcome o = VerificationSuite.run(c, 2, RunListener.NONE, new Cancellation());
        double allowed = 3 * o.estimate().standardError() + c.biasBound();
        ValidationLog.statistical(c.name() + " (dimensionless)", c.source(), c.expected(), o.estimate().value(),
                o.estimate().low(), o.estimate().high(), c.expected() - allowed, c.expected() + allowed,
                "3 standard errors over independent blocks plus the bias bound (" + c.biasReason()
                        + "); 95% interval at most " + Math.round(100 * VerificationCase.MAX_RELATIVE_WIDTH)
                        + "% of the value", o.passed());
        assertTrue(o.passed(), c.name() + ": expected " + c.expected() + ", estimate " + o.estimate() + " ("
                + o.reason() + ")");
    }
}
