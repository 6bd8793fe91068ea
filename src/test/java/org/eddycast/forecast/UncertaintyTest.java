package org.eddycast.forecast;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** The stated uncertainty of a handbook estimate: its band by definition, its wording and its valid range. */
class UncertaintyTest {

    @Test
    void factorBandDividesAndMultiplies() {
        Uncertainty u = Uncertainty.factor(4, "Fischer 1975 (from memory)");
        assertEquals(2.5, u.low(10), 1e-15);
        assertEquals(40, u.high(10), 1e-15);
        assertEquals("within a factor of 4 (Fischer 1975 (from memory))", u.describe());
        assertEquals("within a factor of 1.5", Uncertainty.factor(1.5, "").describe());
    }

    @Test
    void percentBandIsSymmetric() {
        Uncertainty u = Uncertainty.percent(50, "our allowance");
        assertEquals(5, u.low(10), 1e-15);
        assertEquals(15, u.high(10), 1e-15);
        assertEquals("+-50% (our allowance)", u.describe());
        Uncertainty none = Uncertainty.percent(0, null);
        assertEquals(10, none.low(10), 0.0);
        assertEquals(10, none.high(10), 0.0);
        assertEquals("+-0%", none.describe(), "a missing basis reads as none");
        assertEquals("", none.basis());
    }

    @Test
    void outOfRangeAmountsAreRefusedWithTheValidRange() {
        assertEquals("uncertainty factor must be a finite number >= 1; got 0.5",
                assertThrows(IllegalArgumentException.class, () -> Uncertainty.factor(0.5, "")).getMessage());
        assertThrows(IllegalArgumentException.class, () -> Uncertainty.factor(Double.POSITIVE_INFINITY, ""));
        assertEquals("uncertainty percentage must lie in [0, 100); got 100.0",
                assertThrows(IllegalArgumentException.class, () -> Uncertainty.percent(100, "")).getMessage());
        assertThrows(IllegalArgumentException.class, () -> Uncertainty.percent(-1, ""));
        assertThrows(IllegalArgumentException.class, () -> Uncertainty.percent(Double.NaN, ""));
        assertEquals("uncertainty kind must be FACTOR or PERCENT",
                assertThrows(IllegalArgumentException.class, () -> new Uncertainty(null, 2, "")).getMessage());
        Uncertainty.factor(1, "");
        Uncertainty.percent(99.9, "");
    }
}
