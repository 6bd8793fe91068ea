package org.eddycast.transport;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Longitudinal dispersion out of the particles against the exact shear-dispersion results. */
class ShearDispersionTest {

    @Test
    void laminarPlates() {
        double u = 10;
        double d0 = 1;
        double h = 1;
        ChannelTransport model = new ChannelTransport(SectionRuns.section(1, h,
                (y, zeta) -> 6 * u * (zeta - zeta * zeta), (y, z) -> d0, (y, z) -> d0, (y, z) -> d0, true), u);
        TransportSettings s = new TransportSettings(32, 512, 1e-3, 20000, 100, 7);
        java.lang.management.ThreadMXBean mx = java.lang.management.ManagementFactory.getThreadMXBean();
        long start = System.nanoTime();
        CloudMoments m = SectionRuns.run(model, SectionRuns.evenlyOverSection(model), s, 1);
        double secs = (System.nanoTime() - start) / 1e9;
        Estimate k = DispersionEstimator.halfSlope(m, 0, 2, 20);
        double exact = d0 + h * h * u * u / (210 * d0);
        System.out.printf("plates: %s exact %.4f  rate %.3g particle-steps/s%n", k, exact,
                s.particles() * (double) s.steps() / secs);
        assertTrue(k.low() <= exact && exact <= k.high());
    }
}
