package org.eddycast.measure;

import org.eddycast.docs.ValidationLog;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.eddycast.scenario.TurbulenceStatistics;
import org.junit.jupiter.api.Test;

/**
 * The inertial-range fit and the dissipation rate through Kolmogorov's law E11(k1) = C1 eps^(2/3) k1^(-5/3),
 * C1 = 0.53 (Sreenivasan, K. R. 1995, "On the universality of the Kolmogorov constant", Phys. Fluids
 * 7:2778-2784), with Taylor's frozen turbulence k1 = 2 pi f / U (Taylor, G. I. 1938, "The spectrum of
 * turbulence", Proc. R. Soc. Lond. A 164:476-490), on a signal synthesised with exactly that spectrum.
 *
 * <p>Tolerances: eps is proportional to the band mean K of E f^(5/3) to the power 3/2, so its relative
 * standard error is 1.5 times that of K, which is sqrt(2.376 / (segments x estimates)) (see
 * WelchSpectrumEstimatorTest; derived for Gaussian signals, an upper bound for random-phase ones). The
 * slope's standard error from the regression is widened by sqrt(1.944) because neighbouring Hann estimates
 * are correlated (same derivation).
 */
class DissipationRecoveryTest {

    private static final double FS = 64;
    private static final int N = 1 << 15;
    private static final double U = 0.5;
    private static final double EPS = 1e-3;
    private static final double LOW = 0.2;   // Hz, below it the synthetic spectrum is flat

    /**
     * The frequency spectrum of frozen turbulence, written out here independently of the code under test:
     * E(f) = U E11(k1) / (2 pi) with k1 = 2 pi f / U and E11 = 0.53 eps^(2/3) k1^(-5/3), that is
     * E(f) = 0.53 (eps U / (2 pi))^(2/3) f^(-5/3); flat below LOW.
     */
    private static double spectrum(double f) {
        return 0.53 * Math.pow(EPS * U / (2 * Math.PI), 2.0 / 3.0) * Math.pow(Math.max(f, LOW), -5.0 / 3.0);
    }

    private static VelocityRecord kolmogorovRecord(long seed) {
        double[] x = SyntheticRecord.fourierSynthesis(N, FS, DissipationRecoveryTest::spectrum, seed);
        return Records.of(FS, Records.plus(x, U));
    }

    @Test
    void dissipationAndSlopeAreRecoveredFromAnAutomaticBand() {
        RecordAnalysis a = RecordAnalyzer.analyze(kolmogorovRecord(101), AnalysisOptions.defaults());
        InertialRangeFit fit = a.fit().orElseThrow();
        assertTrue(fit.automatic() && fit.inertialRangeFound(), fit.describe());
        assertTrue(fit.lowFrequency() >= LOW && fit.highFrequency() <= FS / 4, fit.describe());
        double se = 1.5 * WelchSpectrumEstimatorTest.relativeStandardError(a.spectrum().segmentCount(), fit.points());
        assertTrue(3 * se < 0.15, "3 SE = " + 3 * se + " is within the 15% asked for");
        double eps = a.scales().dissipationRate();
        ValidationLog.statistical("dissipation rate from a record with an imposed -5/3 spectrum (W/kg)",
                "Kolmogorov 1941 law with C1 = 0.53 (Sreenivasan 1995, Phys. Fluids 7:2778); Welch 1967 spectrum",
                EPS, eps, eps * (1 - 1.96 * se), eps * (1 + 1.96 * se), EPS * (1 - 3 * se), EPS * (1 + 3 * se),
                "3 standard errors of the Welch estimate over the fitted band",
                Math.abs(eps - EPS) <= 3 * se * EPS);
        assertEquals(EPS, a.scales().dissipationRate(), 3 * se * EPS);
        assertEquals(-5.0 / 3.0, fit.slope(), 3 * Math.sqrt(1.944) * fit.slopeStandardError());

        TurbulenceStatistics s = a.statistics();
        assertEquals(a.scales().dissipationRate(), s.dissipationRate());
        assertEquals(fit.slope(), s.spectrum().slope());
    }

    @Test
    void aBandGivenByTheCallerIsUsedAsIs() {
        AnalysisOptions options = AnalysisOptions.defaults().withFitBand(new FrequencyBand(1.0, 5.0));
        RecordAnalysis a = RecordAnalyzer.analyze(kolmogorovRecord(102), options);
        InertialRangeFit fit = a.fit().orElseThrow();
        assertFalse(fit.automatic());
        double df = a.spectrum().resolution();
        assertTrue(fit.lowFrequency() >= 1.0 && fit.lowFrequency() < 1.0 + df);
        assertTrue(fit.highFrequency() <= 5.0 && fit.highFrequency() > 5.0 - df);
        double se = 1.5 * WelchSpectrumEstimatorTest.relativeStandardError(a.spectrum().segmentCount(), fit.points());
        assertEquals(EPS, a.scales().dissipationRate(), 3 * se * EPS);
    }

    @Test
    void aBandWithTooFewEstimatesIsRefusedWithTheSpectrumsRange() {
        AnalysisOptions options = AnalysisOptions.defaults().withFitBand(new FrequencyBand(1.0, 1.02));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> RecordAnalyzer.analyze(kolmogorovRecord(103), options));
        assertTrue(e.getMessage().contains("at least 3") && e.getMessage().contains("in steps of"), e.getMessage());
    }

    @Test
    void whiteNoiseHasNoInertialRange() {
        Random random = new Random(4);
        double[] x = new double[4096];
        for (int i = 0; i < x.length; i++) {
            x[i] = 0.5 + 0.02 * random.nextGaussian();
        }
        RecordAnalysis a = RecordAnalyzer.analyze(Records.of(FS, x), AnalysisOptions.defaults());
        assertTrue(a.fit().isEmpty());
        assertTrue(Double.isNaN(a.scales().dissipationRate()));
        assertTrue(a.warnings().stream().anyMatch(w -> w.contains("no inertial range")), a.warnings().toString());
        assertEquals(-5.0 / 3.0, a.statistics().spectrum().slope(), 1e-15, "Kolmogorov's slope taken");
        assertThrows(IllegalStateException.class, a::statisticsWithModelSpectrum);
    }

    @Test
    void kolmogorovLengthAndTheLevelDissipationRelation() {
        // eps = (2 pi / U) (K / 0.53)^(3/2), worked by hand: K = 1e-3, U = 0.5 m/s gives
        // 4 pi (1.886792e-3)^(3/2) = 4 pi x 8.195698e-5 = 1.029902e-3 W/kg
        assertEquals(1.029902e-3, KolmogorovScales.dissipationRate(1e-3, 0.5), 1e-9);
        // eta = (nu^3 / eps)^(1/4): nu = 1e-6 m^2/s, eps = 1e-4 W/kg gives (1e-14)^(1/4) = 3.1623e-4 m
        assertEquals(3.16227766e-4, KolmogorovScales.kolmogorovLength(1e-6, 1e-4), 1e-12);
        double level = KolmogorovScales.compensatedLevel(2.5e-3, 0.4);
        assertEquals(2.5e-3, KolmogorovScales.dissipationRate(level, 0.4), 1e-15);
        assertTrue(Double.isNaN(KolmogorovScales.dissipationRate(-1, 0.4)));
        assertTrue(Double.isNaN(KolmogorovScales.kolmogorovLength(1e-6, Double.NaN)));
    }
}
