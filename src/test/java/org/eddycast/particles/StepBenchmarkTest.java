package org.eddycast.particles;

import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The microbenchmarks' bodies run and do the work they are named for (so the harness cannot rot unseen). */
class StepBenchmarkTest {

    @Test
    void everyBenchmarkMovesItsParticlesOrFillsItsVariates() {
        for (String integrator : new String[] {"euler", "lie", "strang"}) {
            StepBenchmark b = new StepBenchmark();
            b.integrator = integrator;
            b.prepare();
            b.place();
            double[] before = new double[3];
            double[] after = new double[3];
            b.shared.position(7, before);
            b.sharedDrift();
            b.sharedStep();
            b.shared.position(7, after);
            assertMoved(before, after, integrator + ", shared");
            b.own.position(7, before);
            b.ownDrift();
            b.ownStep();
            b.own.position(7, after);
            assertMoved(before, after, integrator + ", own");
        }
        StepBenchmark b = new StepBenchmark();
        b.integrator = "lie";
        b.prepare();
        double[] v = b.normals();
        assertTrue(v.length == StepBenchmark.VARIATES);
        assertNotEquals(v[0], v[1]);
        for (double x : v) {
            assertTrue(Double.isFinite(x) && Math.abs(x) < 9, "variate " + x);
        }
    }

    private static void assertMoved(double[] before, double[] after, String what) {
        for (int a = 0; a < 3; a++) {
            assertTrue(Double.isFinite(after[a]), what);
            assertNotEquals(before[a], after[a], what + ", axis " + a);
        }
    }
}
