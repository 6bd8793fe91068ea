package org.eddycast.forecast;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class ForecastComparisonTest {

    @Test
    void homogeneousTurbulenceFallsShortOfElderAndSaysWhy() {
        // Elder 1959 (from memory): K = 5.93 h u* = 0.44475 m^2/s for h = 1.5 m, u* = 0.05 m/s; the stated
        // band is a factor of 2. A simulated 0.02 +- 0.002 m^2/s is 22 times smaller: disagreement, and the
        // first reason named must be mean-shear dispersion, which homogeneous turbulence leaves out.
        HandbookEstimate elder = ChannelHandbook.elderLongitudinal(1.5, 0.05);
        Comparison c = ForecastComparison.compare(0.02, 0.018, 0.022, elder);
        assertEquals(0.02 / 0.44475, c.ratio(), 1e-12);
        assertFalse(c.agree());
        assertEquals(ForecastComparison.SHEAR_DISPERSION, c.likelyReasons().get(0));
        assertTrue(c.summary().contains("more slowly"), c.summary());
        // Nothing adjusted: the values come back as given.
        assertEquals(0.02, c.forecast(), 0.0);
        assertEquals(0.44475, c.estimate().value(), 1e-12);
    }

    @Test
    void overlappingIntervalsAgreeAndGiveNoReasons() {
        // Fischer et al. 1979 natural-stream band 0.6 h u* +-50%: 0.0225 to 0.0675 m^2/s here. A forecast of
        // 0.07 with interval [0.06, 0.08] overlaps the band.
        HandbookEstimate natural = ChannelHandbook.transverseMixingNatural(1.5, 0.05);
        Comparison c = ForecastComparison.compare(0.07, 0.06, 0.08, natural);
        assertTrue(c.agree());
        assertTrue(c.likelyReasons().isEmpty());
        // Move the interval just above the band: now they disagree and the forecast mixes faster.
        Comparison above = ForecastComparison.compare(0.08, 0.0676, 0.09, natural);
        assertFalse(above.agree());
        assertEquals(ForecastComparison.ANISOTROPY, above.likelyReasons().get(0));
    }

    @Test
    void longerBlendTimeThanGrenvillePointsToBulkCirculation() {
        // A blend time is a time: a larger forecast means slower mixing. Grenville's 9.12 s for the pilot tank
        // (T/D = 3, Po = 5, N = 3 rev/s), band +-30%; a forecast of 40 s is far slower.
        HandbookEstimate theta = TankBlendCorrelation.blendTime(3.0, 5.0, 1.0, 1.0 / 3.0, 1.0, 1.0034e-6, true, 1);
        Comparison c = ForecastComparison.compare(40.0, theta);
        assertFalse(c.agree());
        assertEquals(ForecastComparison.BULK_CIRCULATION, c.likelyReasons().get(0));
        assertTrue(c.summary().contains("more slowly"), c.summary());
    }

    @Test
    void estimateOutsideItsValidityIsNamedAsAReason() {
        HandbookEstimate tall = TankBlendCorrelation.blendTime(3.0, 5.0, 1.0, 1.0 / 3.0, 2.0, 1.0034e-6, true, 1);
        Comparison c = ForecastComparison.compare(1.0, tall);
        assertTrue(c.likelyReasons().get(c.likelyReasons().size() - 1).contains("H/T = 2"), c.likelyReasons()
                .toString());
    }

    @Test
    void cautionsCoverScreeningProfessionalsPermitsToxicityAndIntakes() {
        String all = String.join(" ", Cautions.ALL).toLowerCase();
        for (String needed : new String[] {"screening estimate", "licensed professionals", "local codes",
                "permit", "authority", "harmful", "drinking-water intakes"}) {
            assertTrue(all.contains(needed), needed);
        }
    }
}
