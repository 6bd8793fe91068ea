package org.eddycast.forecast;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class WidthMeasureTest {

    @Test
    void fullWidthAtHalfMaximumIs2point3548Sigma() {
        // Exact for a Gaussian: 2 sqrt(2 ln 2) = 2.35482 (Crank 1975, The Mathematics of Diffusion; derived).
        assertEquals(2.35482, WidthMeasure.FULL_WIDTH_AT_HALF_MAXIMUM.factorOfSigma(), 1e-5);
        assertEquals(2.35482 * 3.0, WidthMeasure.FULL_WIDTH_AT_HALF_MAXIMUM.width(3.0), 1e-4);
    }

    @Test
    void visibleEdgeIsWhereTheGaussianFallsToTheStatedFraction() {
        double sigma = 1.7;
        double halfWidth = WidthMeasure.VISIBLE_EDGE.width(sigma) / 2.0;
        // Evaluate the Gaussian profile itself at the edge: it must be 10% of the peak.
        double relative = Math.exp(-halfWidth * halfWidth / (2.0 * sigma * sigma));
        assertEquals(WidthMeasure.DEFAULT_EDGE_FRACTION, relative, 1e-12);
        assertEquals(4.2919, WidthMeasure.VISIBLE_EDGE.factorOfSigma(), 1e-4);
    }

    @Test
    void standardDeviationIsSigma() {
        assertEquals(0.25, WidthMeasure.STANDARD_DEVIATION.width(0.25), 0.0);
    }

    @Test
    void badFractionIsRejectedWithItsRange() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> WidthMeasure.fullWidthAtFraction(1.0, 1.5));
        assertEquals("fraction must lie strictly between 0 and 1; got 1.5", e.getMessage());
    }
}
