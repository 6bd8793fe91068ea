package org.eddycast.transport;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.eddycast.docs.ValidationLog;
import org.eddycast.particles.Cancellation;
import org.junit.jupiter.api.Test;

/**
 * Station curves from the transport stage's particles against the Gaussian passage curve, exact for a uniform
 * velocity U and a constant diffusivity K: the cross-section mean concentration of a slug of mass M in a section
 * of area A is C(x, t) = M / (A sqrt(4 pi K t)) exp(-(x - U t)^2 / (4 K t)) (Crank 1975, The Mathematics of
 * Diffusion, 2nd ed., eq. 2.6 for a plane source). The walls across and over the depth do not touch the
 * along-flow coordinate, so the curve is exact whatever the release's place in the section.
 */
class StationCurveTest {

    private static final double U = 1;
    private static final double K = 0.05;
    private static final double STATION = 5;
    private static final double MASS = 2;
    private static final double DEPTH = 0.5;
    private static final double WIDTH = 2;

    /**
     * Each record's 95% band is Student's t over 32 independent blocks, so where the curve is resolved (exact
     * value above a tenth of its peak) the exact value should fall outside it at about 5% of the records; the
     * test accepts at most 15% (the records are correlated through the particles they share, so the misses come
     * in runs, but more than three times the expected share would mean a bias). Then quadrupling the particles
     * must shrink the root-mean-square relative error towards half (counting noise goes as 1 / sqrt(n)); the
     * test accepts below 0.7 of it.
     */
    @Test
    void stationCurveConvergesToTheGaussianPassage() {
        double[] small = errors(512, 21, "section mean");
        double[] large = errors(2048, 22, "section mean");
        assertTrue(small[0] <= 0.15, "share of records outside the band at 16,384 particles: " + small[0]);
        assertTrue(large[0] <= 0.15, "share of records outside the band at 65,536 particles: " + large[0]);
        assertTrue(large[1] < 0.7 * small[1], "rms relative error did not shrink with 4x particles: "
                + small[1] + " then " + large[1]);
    }

    /** With the tracer spread evenly over the section, the strip holding a position across reads the same curve. */
    @Test
    void stripAcrossReadsTheSameCurveWhenTheSectionIsEvenlyFilled() {
        double[] strip = errors(512, 23, "strip");
        assertTrue(strip[0] <= 0.15, "share of records outside the band in the strip: " + strip[0]);
    }

    /** Returns the share of resolved records whose exact value lies outside the band, and the rms relative error. */
    private static double[] errors(int blockSize, long seed, String which) {
        ChannelTransport model = new ChannelTransport(SectionRuns.section(WIDTH, DEPTH, (y, zeta) -> U,
                (y, z) -> K, (y, z) -> K, (y, z) -> K, true), U);
        TransportSettings s = new TransportSettings(32, blockSize, 0.01, 800, 4, seed);
        double[] times = s.recordTimes();
        CloudMoments moments = new CloudMoments(U, times, s.blocks());
        int strips = 16;
        int strip = 3;
        StationCounts counts = new StationCounts(new double[] {STATION, STATION}, new int[] {-1, strip}, WIDTH,
                strips, U * s.timeStep() * 4, 40, s.blocks(), s.records());
        TransportRunner.run(model, SectionRuns.evenlyOverSection(model), s, List.of(moments, counts), 2,
                f -> { }, new Cancellation());
        double area = WIDTH * DEPTH;
        StationCurve[] curves = StationCurves.of(counts, moments, MASS, area, new double[] {1, 1.0 / strips},
                new double[] {Double.NaN, (strip + 0.5) * WIDTH / strips});
        StationCurve curve = curves[which.equals("strip") ? 1 : 0];
        double[] c = curve.concentration();
        double[] lo = curve.low();
        double[] hi = curve.high();
        double peak = exact(STATION / U);
        int resolved = 0;
        int outside = 0;
        double squares = 0;
        for (int j = 0; j < times.length; j++) {
            double e = exact(times[j]);
            if (e < 0.1 * peak) {
                continue;
            }
            resolved++;
            if (e < lo[j] || e > hi[j]) {
                outside++;
            }
            squares += Math.pow((c[j] - e) / e, 2);
        }
        double share = (double) outside / resolved;
        double rms = Math.sqrt(squares / resolved);
        Passage p = Passage.of(curve, Double.NaN);
        ValidationLog.statistical("station curve against the Gaussian passage (" + which + ", "
                        + 32 * blockSize + " particles): share of records outside the 95% band",
                "Crank 1975, The Mathematics of Diffusion: C = M / (A sqrt(4 pi K t)) exp(-(x - U t)^2 / (4 K t))",
                0.05, share, Double.NaN, Double.NaN, 0, 0.15, "at most 15% of resolved records outside the band",
                share <= 0.15);
        assertTrue(resolved > 20, "records across the passage: " + resolved);
        assertEquals(STATION / U, p.peakTime(), 0.1 * STATION / U, "time of the peak near x / U");
        return new double[] {share, rms};
    }

    private static double exact(double t) {
        double d = STATION - U * t;
        return MASS / (WIDTH * DEPTH * Math.sqrt(4 * Math.PI * K * t)) * Math.exp(-d * d / (4 * K * t));
    }

    /** Threshold crossings are placed by linear interpolation between records. */
    @Test
    void passageReadsCrossingsByInterpolation() {
        double[] t = {1, 2, 3, 4, 5, 6};
        double[] c = {0, 2, 6, 4, 1, 0};
        StationCurve curve = new StationCurve(10, Double.NaN, t, c, c, c, new double[6], new double[6]);
        Passage p = Passage.of(curve, 1.0);
        assertEquals(1.5, p.arrival(), 1e-12);
        assertEquals(3, p.peakTime(), 1e-12);
        assertEquals(6, p.peak(), 1e-12);
        assertEquals(5.0, p.fallsBack(), 1e-12, "the value 1 at t = 5 is not above the threshold");
        assertEquals(3.5, p.aboveThresholdFor(), 1e-12);
        Passage none = Passage.of(curve, 7.0);
        assertTrue(Double.isNaN(none.arrival()) && Double.isNaN(none.aboveThresholdFor()));
        Passage stillAbove = Passage.of(new StationCurve(10, Double.NaN, t, new double[] {0, 2, 3, 4, 5, 6}, c, c,
                new double[6], new double[6]), 1.0);
        assertTrue(stillAbove.stillAboveAtEnd() && Double.isNaN(stillAbove.fallsBack()));
        assertEquals(6 - 1.5, stillAbove.aboveThresholdFor(), 1e-12);
    }
}
