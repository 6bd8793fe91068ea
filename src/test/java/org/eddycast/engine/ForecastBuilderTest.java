package org.eddycast.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.eddycast.forecast.Forecast;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.stats.AxisEstimate;
import org.eddycast.docs.ValidationLog;
import org.junit.jupiter.api.Test;

/**
 * The forecast against Taylor's two limits (Taylor 1921, "Diffusion by continuous movements", Proc. London
 * Math. Soc. s2-20:196): late, sigma^2 = 2 D t with the engine's D inside its interval; early, sigma^2 = u'^2 t^2.
 */
class ForecastBuilderTest {

    private static StudyResult run(String preset, int particles) throws Exception {
        String text = Files.readString(Path.of("presets", preset))
                .replaceAll("\"particles\": \\d+", "\"particles\": " + particles);
        Scenario s = ScenarioReader.parse(text, Path.of("presets").toAbsolutePath());
        return Engine.run(s, 2, RunListener.NONE, new Cancellation());
    }

    @Test
    void lateWidthsFollowTwoDtAndEarlyWidthsFollowTheBallisticLaw() throws Exception {
        StudyResult r = run("canal-dye-test.json", 2048);
        Forecast f = r.forecast();
        double factor = f.widthFactor();
        double[] t = f.times();
        int last = t.length - 1;
        assertTrue(t[last] > 5 * f.simulatedUntil(), "the default horizon reaches well past the simulation");
        for (AxisEstimate a : r.diffusivity().axes()) {
            double sigma = f.width()[a.axis()][last] / factor;
            double apparent = sigma * sigma / (2 * t[last]);
            // sigma^2 = sigma^2(T) + 2 D (t - T): at t = 10 T the offset is a small part; the apparent D lies
            // within the band built from D's interval and the curve's error at T.
            double lowSigma = f.widthLow()[a.axis()][last] / factor;
            double highSigma = f.widthHigh()[a.axis()][last] / factor;
            assertTrue(lowSigma <= sigma && sigma <= highSigma);
            // Beyond the simulation the variance grows by exactly 2 D per unit time from the simulated curve's
            // last value: an identity, so the tolerance is rounding (the width went through a square root).
            double[] msd = r.diffusivity().meanSquareDisplacement(a.axis());
            double[] simulated = r.diffusivity().times();
            double end = simulated[simulated.length - 1];
            double continued = msd[msd.length - 1] + 2 * a.diffusivity().value() * (t[last] - end);
            assertEquals(continued, sigma * sigma, 1e-12 * continued,
                    "axis " + a.axisName() + ": sigma^2(T) + 2 D (t - T)");
            ValidationLog.exact("canal preset, late plume variance / 2t against D, axis " + a.axisName()
                    + " (m^2/s)", "Taylor 1921, Diffusion by continuous movements, Proc. London Math. Soc. "
                    + "s2-20:196: sigma^2 -> 2 D t", a.diffusivity().value(), apparent,
                    0.15 * a.diffusivity().value(), "within 15% at ten times the simulated time");
            assertEquals(a.diffusivity().value(), apparent, 0.15 * a.diffusivity().value(),
                    "axis " + a.axisName() + ": late variance / 2t");
            double lowD = lowSigma * lowSigma / (2 * t[last]);
            double highD = highSigma * highSigma / (2 * t[last]);
            assertTrue(lowD <= a.diffusivity().high() && highD >= a.diffusivity().low(),
                    "band consistent with D's interval");
        }
        double u = 0.04;
        double sigmaEarly = f.width()[0][0] / factor;
        // First grid point: one time step, the first record of the simulated curve, where Taylor's curve for an
        // exponential correlation, 2 u'^2 T_L [t - T_L (1 - e^(-t/T_L))] = u'^2 t^2 (1 - t / (3 T_L) + ...),
        // applies (2 D0 t is below 1e-14 m^2 here). Tolerance: four standard errors of the simulated curve at
        // that record (over independent blocks); the series' next term is (t / T_L)^2 / 12, below 3e-5.
        double[] recordTimes = r.diffusivity().times();
        assertEquals(recordTimes[0], t[0], 1e-15, "the grid starts at the first record");
        double tl = r.diffusivity().axes().get(0).lagrangianTimeScale();
        double ballistic = u * u * t[0] * t[0] * (1 - t[0] / (3 * tl));
        double allowed = 4 * r.diffusivity().meanSquareDisplacementError(0)[0];
        ValidationLog.exact("canal preset, plume variance after one step against u'^2 t^2 (1 - t / 3 T_L) (m^2)",
                "Taylor 1921, Diffusion by continuous movements, Proc. London Math. Soc. s2-20:196: sigma^2 = "
                        + "2 u'^2 T_L [t - T_L (1 - exp(-t/T_L))] for an exponential correlation",
                ballistic, sigmaEarly * sigmaEarly, allowed, "within 4 standard errors of the simulated curve");
        assertEquals(ballistic, sigmaEarly * sigmaEarly, allowed, "ballistic start");
        assertTrue(allowed < 0.2 * ballistic, "the check is tighter than the former 15% on the width");
    }

    @Test
    void everyForecastCarriesCautionsAndAssumptions() throws Exception {
        StudyResult r = run("mixing-tank-dose.json", 1024);
        Forecast f = r.forecast();
        assertFalse(f.cautions().isEmpty());
        assertTrue(f.cautions().stream().anyMatch(c -> c.contains("licensed professionals")));
        assertTrue(f.assumptions().stream().anyMatch(a -> a.contains("random-displacement model")));
        assertTrue(f.mixing().stream().anyMatch(m -> m.name().startsWith("blend time 95% (every cell within 5%")),
                "a 95% blend time among " + f.mixing());
        assertTrue(f.mixing().get(0).low() <= f.mixing().get(0).value());
        assertTrue(f.mixing().get(0).value() <= f.mixing().get(0).high());
        assertEquals(1, f.handbook().size(), "the blend-time correlation beside the simulated blend time");
        // Peak concentration falls, and tends to the mixed value mass / volume in the closed tank.
        double[] peak = f.peakConcentration();
        assertTrue(peak[0] > peak[peak.length - 1]);
        double mixed = 0.5 / (Math.PI * 2.0 * 2.0 / 4 * 2.0);
        assertEquals(mixed, peak[peak.length - 1], 0.06 * mixed, "peak at twice the blend time is near mixed");
        // Widths level off at those of a cloud spread evenly through the cylinder: sigma = R / 2 across (the
        // variance of one coordinate over a disc is R^2 / 4) and H / sqrt(12) over the height; within 4 sampling
        // errors of a variance of n particles, 4 sqrt(2 / n) / 2 in sigma
        int last = f.times().length - 1;
        double[] sigma = {0.5, 0.5, 2.0 / Math.sqrt(12)};
        double n = ((org.eddycast.transport.TankStageResult) r.transport()).particles();
        for (int a = 0; a < 3; a++) {
            double uniform = f.widthFactor() * sigma[a];
            assertEquals(uniform, f.width()[a][last], 2 * Math.sqrt(2 / n) * uniform, "axis " + a + " width once mixed");
        }
    }

    @Test
    void optionsSharingADimensionlessCaseAreSimulatedOnce() throws Exception {
        SimulationCache.shared().clear();
        String base = Files.readString(Path.of("presets", "canal-dye-test.json"))
                .replaceAll("\"particles\": \\d+", "\"particles\": 1024");
        // Doubling u', L and tau together keeps the Kubo number; D0 doubled by 4 keeps the Peclet number
        // (Pe = u' L / D0), and time step and duration scale with L/u' (unchanged here).
        String scaled = base.replace("\"rmsVelocity\": 0.04", "\"rmsVelocity\": 0.08")
                .replace("\"integralLength\": 0.25", "\"integralLength\": 0.5")
                .replace("\"molecularDiffusivity\": 4.25e-10", "\"molecularDiffusivity\": 1.7e-9");
        StudyResult a = Engine.run(ScenarioReader.parse(base), 2, RunListener.NONE, new Cancellation());
        StudyResult b = Engine.run(ScenarioReader.parse(scaled), 2, RunListener.NONE, new Cancellation());
        assertFalse(a.diffusivity().fromCache());
        assertTrue(b.diffusivity().fromCache(), "the second option reuses the first simulation");
        double ratio = b.diffusivity().axes().get(0).diffusivity().value()
                / a.diffusivity().axes().get(0).diffusivity().value();
        assertEquals(4.0, ratio, 1e-9, "D scales with u' L");
        String verdict = org.eddycast.report.OptionComparison.of(List.of("a", "b"), List.of(a, b)).verdict();
        assertTrue(verdict.contains("spreads the tracer faster"), verdict);
    }

    /**
     * A continuous release in a channel: far downstream the plume is mixed over the whole section, so its
     * concentration tends to the fully mixed value q / (U W h) (mass balance; Fischer et al. 1979, Mixing in
     * Inland and Coastal Waters, ch. 5).
     */
    @Test
    void continuousReleaseTendsToTheFullyMixedConcentration() throws Exception {
        String text = Files.readString(Path.of("presets", "lowland-channel-dye.json"))
                .replaceAll("\"particles\": \\d+", "\"particles\": 1024")
                .replaceFirst("\"mass\": [0-9.eE+-]+,", "\"mass\": 0.2, \"rate\": 0.01,")
                // without the station's question: a far station lengthens the run, and the grid starts at the
                // first record, further from the source
                .replaceAll("\"stations\": \\[[^\\]]*\\],\\s*", "")
                .replaceAll("\"targetPeak\": [^,]+,\\s*", "")
                .replaceAll("\"cap\": \\{[^}]*\\},\\s*", "");
        StudyResult r = Engine.run(ScenarioReader.parse(text), 2, RunListener.NONE, new Cancellation());
        double[] plume = r.forecast().plumeConcentration();
        assertEquals(r.forecast().grid().length, plume.length);
        double mixed = 0.01 / (0.45 * 6.0 * 1.2);
        double last = plume[plume.length - 1];
        // The grid ends at 1.2 times the distance to mixed across the width (5% criterion).
        assertEquals(mixed, last, 0.05 * mixed, "fully mixed far downstream");
        assertTrue(plume[0] > 10 * mixed, "concentrated near the source");
        StudyResult none = run("lowland-channel-dye.json", 1024);
        assertEquals(0, none.forecast().plumeConcentration().length, "no continuous release, no plume");
    }
}
