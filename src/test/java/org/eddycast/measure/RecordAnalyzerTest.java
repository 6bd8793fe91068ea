package org.eddycast.measure;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;

import org.eddycast.scenario.Derivation;
import org.eddycast.scenario.SpectrumSpec;
import org.eddycast.scenario.TurbulenceStatistics;
import org.junit.jupiter.api.Test;

/** From record to turbulence statistics: the rules for each regime and the derivation of every value. */
class RecordAnalyzerTest {

    private static final double FS = 64;
    private static final int N = 1 << 14;

    private static double[] kolmogorov(double eps, double speed, long seed) {
        return SyntheticRecord.fourierSynthesis(N, FS, SyntheticRecord.kolmogorovSpectrum(eps, speed, 0.2), seed);
    }

    private static Set<String> quantities(List<Derivation> derivations) {
        return derivations.stream().map(Derivation::quantity).collect(Collectors.toSet());
    }

    @Test
    void frozenTurbulenceThreeComponents() {
        double u = 0.5;
        VelocityRecord r = Records.of(FS, Records.plus(kolmogorov(1e-3, u, 1), u), kolmogorov(1e-3, u, 2),
                kolmogorov(1e-3, u, 3));
        RecordAnalysis a = RecordAnalyzer.analyze(r, AnalysisOptions.defaults());
        ScaleEstimates s = a.scales();
        assertEquals(FlowRegime.FROZEN_TURBULENCE, s.regime());
        assertEquals(a.meanSpeed(), s.convectionSpeed());
        // Taylor 1938: L = U T; correlation time L / u' (common practice)
        assertEquals(a.meanSpeed() * s.integralTime(), s.integralLength(), 1e-15);
        assertEquals(s.integralLength() / a.rmsVelocity(), s.correlationTime(), 1e-12);
        double f = a.fit().orElseThrow().highFrequency();
        double ratio = Math.min(64, Math.max(1, 2 * Math.PI * f / a.meanSpeed() * s.integralLength()));
        assertEquals(ratio, s.wavenumberRatio(), 1e-12);

        TurbulenceStatistics t = a.statistics();
        assertEquals(3, t.dimensions());
        assertEquals(a.rmsVelocity(), t.rmsVelocity());
        double[] rms = a.components().stream().mapToDouble(ComponentStatistics::rms).toArray();
        assertArrayEquals(rms, t.componentRms(), 0.0);
        assertEquals(Math.sqrt((rms[0] * rms[0] + rms[1] * rms[1] + rms[2] * rms[2]) / 3), t.rmsVelocity(), 1e-15);
        assertEquals(a.meanSpeed(), t.meanVelocity());
        assertEquals(SpectrumSpec.Model.POWER_LAW, t.spectrum().model());
        assertEquals(s.wavenumberRatio(), t.spectrum().wavenumberRatio());
        assertEquals(s.integralLength(), t.integralLength());
        assertEquals(s.correlationTime(), t.correlationTime());

        assertEquals(t.spectrum(), a.powerLawSpectrum());
        TurbulenceStatistics m = a.statisticsWithModelSpectrum();
        assertEquals(m.spectrum(), a.modelSpectrum());
        assertEquals(SpectrumSpec.Model.MODEL_SPECTRUM, m.spectrum().model());
        // Kolmogorov 1941: eta = (nu^3 / eps)^(1/4), water at 20 C by default
        assertEquals(Math.pow(Math.pow(1.0034e-6, 3) / a.scales().dissipationRate(), 0.25),
                m.spectrum().kolmogorovLength(), 1e-15);

        assertTrue(quantities(t.derivations()).containsAll(Set.of("sampling rate", "mean speed", "rms velocity",
                "integral time", "spectrum slope", "dissipation rate", "integral length", "correlation time",
                "Kolmogorov length", "wavenumber ratio", "dimensions", "spectrum model")));
        for (Derivation d : t.derivations()) {
            assertFalse(d.rule().isBlank() || d.source().isBlank(), d.toString());
        }
        assertTrue(a.warnings().isEmpty(), a.warnings().toString());
    }

    @Test
    void oneComponentIsTreatedAsIsotropicInThreeDimensions() {
        RecordAnalysis a = RecordAnalyzer.analyze(Records.of(FS, Records.plus(kolmogorov(1e-3, 0.5, 4), 0.5)),
                AnalysisOptions.defaults());
        TurbulenceStatistics t = a.statistics();
        assertEquals(3, t.dimensions());
        double rms = a.components().get(0).rms();
        assertArrayEquals(new double[] {rms, rms, rms}, t.componentRms(), 0.0);
        assertTrue(a.warnings().stream().anyMatch(w -> w.contains("isotropic")), a.warnings().toString());
    }

    @Test
    void twoComponentsGiveTwoDimensions() {
        RecordAnalysis a = RecordAnalyzer.analyze(Records.of(FS, Records.plus(kolmogorov(1e-3, 0.5, 5), 0.5),
                kolmogorov(1e-3, 0.5, 6)), AnalysisOptions.defaults());
        assertEquals(2, a.statistics().dimensions());
        assertEquals(2, a.statistics().componentRms().length);
    }

    @Test
    void highIntensityWarnsButKeepsFrozenTurbulence() {
        // u' about 0.085 m/s (eps 1e-3 at 0.5 m/s, see DissipationRecoveryTest) over a mean of 0.25 m/s: u'/U near 0.34
        RecordAnalysis a = RecordAnalyzer.analyze(Records.of(FS, Records.plus(kolmogorov(1e-3, 0.5, 7), 0.25)),
                AnalysisOptions.defaults());
        assertTrue(a.turbulenceIntensity() > 0.2 && a.turbulenceIntensity() < 0.5, "I = " + a.turbulenceIntensity());
        assertEquals(FlowRegime.FROZEN_TURBULENCE_QUESTIONABLE, a.scales().regime());
        assertTrue(a.warnings().stream().anyMatch(w -> w.contains("doubtful") && w.contains("0.2")), a.warnings().toString());
        assertEquals(a.meanSpeed() * a.scales().integralTime(), a.scales().integralLength(), 1e-15);
    }

    @Test
    void smallMeanSpeedUsesTheFallbackRules() {
        VelocityRecord r = Records.of(FS, Records.plus(kolmogorov(1e-3, 0.5, 8), 0.02), kolmogorov(1e-3, 0.5, 9),
                kolmogorov(1e-3, 0.5, 10));
        RecordAnalysis a = RecordAnalyzer.analyze(r, AnalysisOptions.defaults());
        ScaleEstimates s = a.scales();
        assertEquals(FlowRegime.SMALL_MEAN_SPEED, s.regime());
        double up = a.rmsVelocity();
        assertEquals(Math.sqrt(a.meanSpeed() * a.meanSpeed() + 3 * up * up), s.convectionSpeed(), 1e-15);
        assertEquals(up * up * up / s.dissipationRate(), s.integralLength(), 1e-12 * s.integralLength());
        assertEquals(s.integralTime(), s.correlationTime(), 0.0);
        assertTrue(a.streamwiseSignal().contains("u [m/s]"), a.streamwiseSignal());
        assertTrue(a.warnings().stream().anyMatch(w -> w.contains("frozen turbulence does not apply")));
        assertTrue(a.statistics().derivations().stream().anyMatch(d -> d.quantity().equals("convection speed")));
        assertTrue(a.statistics().derivations().stream().anyMatch(d -> d.quantity().equals("integral length")
                && d.source().contains("common practice")));
    }

    @Test
    void optionsAreCheckedAndNamed() {
        AnalysisOptions d = AnalysisOptions.defaults();
        assertThrows(IllegalArgumentException.class, () -> d.withSegmentLength(100));
        assertThrows(IllegalArgumentException.class, () -> d.withKinematicViscosity(0));
        assertThrows(IllegalArgumentException.class, () -> d.withSamplingRate(-5));
        assertThrows(IllegalArgumentException.class, () -> d.withIntensityLimits(0.6, 0.5));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new FrequencyBand(2, 1));
        assertTrue(e.getMessage().contains("upper frequency"), e.getMessage());
    }
}
