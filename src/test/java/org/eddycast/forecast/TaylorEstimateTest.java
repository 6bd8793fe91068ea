package org.eddycast.forecast;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Taylor's long-time limit D = D0 + u'^2 T_L with T_L = tau (Taylor 1921, "Diffusion by continuous movements",
 * Proc. London Math. Soc. s2-20:196; CHECK-VALUES.md: exact for a uniform Ornstein-Uhlenbeck velocity, the k = 0
 * case of the time-correlated shear).
 */
class TaylorEstimateTest {

    @Test
    void valueIsTaylorsLongTimeLimit() {
        HandbookEstimate e = TaylorEstimate.longTime(0.05, 2.0, 1.0, 1e-9);
        assertEquals(1e-9 + 0.05 * 0.05 * 2.0, e.value(), 1e-15);
        assertTrue(e.withinValidity(), "Kubo number 0.1 is small: no warning");
    }

    @Test
    void largeKuboNumberIsFlaggedWithTheReasonTheSimulationFallsBelow() {
        HandbookEstimate e = TaylorEstimate.longTime(1, 1, 1, 0.01);
        assertTrue(!e.withinValidity() && e.warnings().get(0).contains("Kubo number u' tau / L = 1.00"),
                e.warnings().toString());
        Comparison below = ForecastComparison.compare(0.5, 0.45, 0.55, e);
        assertTrue(!below.agree() && below.ratio() < 1, below.summary());
        assertTrue(below.likelyReasons().stream().anyMatch(r -> r.contains("leave their eddies")), below.likelyReasons()
                .toString());
    }
}
