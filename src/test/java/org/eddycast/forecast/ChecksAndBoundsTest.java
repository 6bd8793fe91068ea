package org.eddycast.forecast;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/**
 * The small contracts the forecasts rest on: argument checks pass a valid value through and name the field, the
 * range and the unit otherwise; each axis density says where its fluid lies; and the width factors are those
 * of a Gaussian, 2 sqrt(2 ln(1/f)) sigma for the full width at a fraction f of the peak (2.3548 sigma at half
 * maximum; exact).
 */
class ChecksAndBoundsTest {

    private static String message(Runnable r) {
        return assertThrows(IllegalArgumentException.class, r::run).getMessage();
    }

    @Test
    void checksReturnTheValueAtTheEdgesOfTheirRanges() {
        assertEquals(0.0, Checks.nonNegative("depth", 0.0, "m"), 0.0);
        assertEquals(2.5, Checks.nonNegative("depth", 2.5, "m"), 0.0);
        assertEquals(-3.0, Checks.finite("release", -3.0, "m"), 0.0);
        assertEquals(1.0, Checks.within("fraction", 1.0, 0.0, 1.0, ""), 0.0);
        assertEquals(0.0, Checks.within("fraction", 0.0, 0.0, 1.0, ""), 0.0);
        assertEquals(0.25, Checks.openFraction("edge", 0.25), 0.0);
        assertArrayEquals(new double[] {1, 2}, Checks.length("pair", new double[] {1, 2}, 2), 0.0);
    }

    @Test
    void checksNameTheFieldTheRangeAndTheUnit() {
        assertEquals("depth must be a finite number >= 0 m; got -1.0",
                message(() -> Checks.nonNegative("depth", -1.0, "m")));
        assertEquals("depth must be a finite number >= 0 m; got Infinity",
                message(() -> Checks.nonNegative("depth", Double.POSITIVE_INFINITY, "m")));
        assertEquals("release must be a finite number; got NaN", message(() -> Checks.finite("release", Double.NaN, "")));
        assertEquals("fraction must lie in [0.0, 1.0]; got 1.5",
                message(() -> Checks.within("fraction", 1.5, 0.0, 1.0, null)));
        assertEquals("edge must lie strictly between 0 and 1; got 1.0", message(() -> Checks.openFraction("edge", 1.0)));
        assertEquals("edge must lie strictly between 0 and 1; got 0.0", message(() -> Checks.openFraction("edge", 0.0)));
        assertEquals("pair must hold 2 values; got 3", message(() -> Checks.length("pair", new double[3], 2)));
        assertEquals("pair must hold 2 values; got none", message(() -> Checks.length("pair", null, 2)));
    }

    @Test
    void eachAxisSaysWhereItsFluidLies() {
        FreeAxis free = new FreeAxis(0.0, 1e-3);
        assertEquals(Double.NEGATIVE_INFINITY, free.lowerBound(), 0.0);
        assertEquals(Double.POSITIVE_INFINITY, free.upperBound(), 0.0);
        OneWallAxis above = new OneWallAxis(-1.0, true, 0.0, 1e-3);
        assertEquals(-1.0, above.lowerBound(), 0.0);
        assertEquals(Double.POSITIVE_INFINITY, above.upperBound(), 0.0);
        assertEquals(0.0, above.density(-1.01, 10), 0.0, "nothing behind the wall");
        assertEquals(0.0, above.lowestDensity(10), 0.0);
        OneWallAxis below = new OneWallAxis(2.0, false, 1.0, 1e-3);
        assertEquals(Double.NEGATIVE_INFINITY, below.lowerBound(), 0.0);
        assertEquals(2.0, below.upperBound(), 0.0);
        assertEquals(0.0, below.density(2.01, 10), 0.0, "nothing behind the wall");
        TwoWallImageAxis images = new TwoWallImageAxis(-0.5, 1.5, 0.2, 1e-3);
        assertEquals(-0.5, images.lowerBound(), 0.0);
        assertEquals(1.5, images.upperBound(), 0.0);
        assertEquals(2.0, images.gap(), 0.0);
        TwoWallCosineAxis cosines = new TwoWallCosineAxis(-0.5, 1.5, 0.2, 1e-3);
        assertEquals(-0.5, cosines.lowerBound(), 0.0);
        assertEquals(1.5, cosines.upperBound(), 0.0);
        assertEquals(2.0, cosines.gap(), 0.0);
        // Long after release both series tend to the uniform density 1 / gap.
        assertEquals(0.5, images.lowestDensity(1e5), 1e-9);
        assertEquals(0.5, cosines.lowestDensity(1e5), 1e-9);
    }

    @Test
    void widthFactorsAreTheGaussiansFullWidths() {
        assertEquals(1.0, Forecast.factor(WidthMeasure.STANDARD_DEVIATION, 0.1), 0.0);
        assertEquals(2.3548, Forecast.factor(WidthMeasure.FULL_WIDTH_AT_HALF_MAXIMUM, 0.1), 5e-5);
        assertEquals(2 * Math.sqrt(2 * Math.log(20)), Forecast.factor(WidthMeasure.VISIBLE_EDGE, 0.05), 1e-12);
        assertEquals(4.2919, WidthMeasure.VISIBLE_EDGE.factorOfSigma(), 5e-5);
        assertEquals(2 * 0.3 * Math.sqrt(2 * Math.log(4)), WidthMeasure.fullWidthAtFraction(0.3, 0.25), 1e-12);
        assertEquals("full width at half maximum", WidthMeasure.FULL_WIDTH_AT_HALF_MAXIMUM.label());
        assertEquals("2 sqrt(2 ln 2) sigma = 2.3548 sigma", WidthMeasure.FULL_WIDTH_AT_HALF_MAXIMUM.formula());
    }
}
