package org.eddycast.forecast;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/**
 * The steady plume of a continuous release in a channel (Fischer et al. 1979, Mixing in Inland and Coastal
 * Waters, ch. 5, from memory; the Gaussian plume with the method of images): mass balance through every
 * section, free-space widths sqrt(2 eps x / U), and the distance to mixed over the depth for a release at the
 * bed against the cosine series' leading term ln(40) / pi^2 U h^2 / eps_z (derived in ChannelMixingDistance).
 */
class ChannelPlumeTest {

    private static final double Q = 0.2;
    private static final double U = 0.5;
    private static final double H = 2.5;
    private static final double W = 25.0;
    private static final double EPS_T = 0.03;
    private static final double EPS_Z = 0.006;

    private static ChannelPlume plume() {
        return new ChannelPlume(Q, U, H, W, EPS_T, EPS_Z, 5.0, 0.0);
    }

    /** Mass balance: U h times the depth-averaged concentration, integrated across the width, is q. */
    @Test
    void everySectionCarriesTheReleaseRate() {
        ChannelPlume p = plume();
        for (double x : new double[] {20, 300, 5000}) {
            int n = 4000;
            double dy = W / n;
            double flux = 0;
            for (int i = 0; i <= n; i++) {
                double w = i == 0 || i == n ? 0.5 : 1.0;
                flux += w * p.depthAveragedConcentration(x, i * dy) * dy;
            }
            assertEquals(Q, U * H * flux, 1e-4 * Q, "mass flux at x = " + x);
        }
    }

    @Test
    void widthsGrowAsTheSquareRootOfTheTravelTime() {
        ChannelPlume p = plume();
        double x = 400;
        assertEquals(800, p.travelTime(x), 1e-12);
        assertEquals(Math.sqrt(2 * EPS_T * 800), p.lateralSigma(x), 1e-12);
        assertEquals(Math.sqrt(2 * EPS_Z * 800), p.verticalSigma(x), 1e-12);
        assertEquals(2.3548 * p.lateralSigma(x), p.lateralWidth(WidthMeasure.FULL_WIDTH_AT_HALF_MAXIMUM, x),
                5e-5 * p.lateralSigma(x));
        assertEquals(2.3548 * p.verticalSigma(x), p.verticalWidth(WidthMeasure.FULL_WIDTH_AT_HALF_MAXIMUM, x),
                5e-5 * p.verticalSigma(x));
        assertEquals(H, p.depth(), 0.0);
        assertEquals(W, p.width(), 0.0);
    }

    /** The cosine series' first term gives ln(40) / pi^2 = 0.374 for a release at the bed; the rest, about 1%. */
    @Test
    void distanceToMixedOverTheDepthFromTheBed() {
        double expected = Math.log(40) / (Math.PI * Math.PI) * U * H * H / EPS_Z;
        assertEquals(expected, plume().distanceToMixedOverDepth(), 0.02 * expected);
    }

    @Test
    void banksAndWidthAreRequired() {
        ChannelPlume open = new ChannelPlume(Q, U, H, Double.POSITIVE_INFINITY, EPS_T, EPS_Z, 0.0, 0.0);
        assertEquals("no distance to mixed across the width: the width is not given",
                assertThrows(IllegalStateException.class, open::distanceToMixedAcrossWidth).getMessage());
        assertEquals("width must be > 0 m (or infinite for no banks); got 0.0", assertThrows(
                IllegalArgumentException.class, () -> new ChannelPlume(Q, U, H, 0.0, EPS_T, EPS_Z, 0, 0)).getMessage());
    }
}
