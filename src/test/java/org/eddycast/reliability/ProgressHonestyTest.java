package org.eddycast.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.eddycast.engine.DiffusivityResult;
import org.eddycast.engine.DiffusivityStudy;
import org.eddycast.engine.DimensionlessCase;
import org.eddycast.engine.Scales;
import org.eddycast.field.PowerLawBand;
import org.eddycast.field.RandomFourierModel;
import org.eddycast.field.SpectrumTable;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.Integrator;
import org.eddycast.particles.RunListener;
import org.junit.jupiter.api.Test;

/**
 * The progress estimate stays honest over a run of any length: the fraction never goes back, ends at exactly
 * 1, and counts the work done: whenever a batch of blocks is merged it lies between the share of the planned
 * blocks merged and that share plus the next batch, which is already running (every block costs the same
 * work, so the fraction grows with the work and a remaining-time estimate from it holds).
 */
class ProgressHonestyTest {

    private record Report(double fraction, long blocksMerged) {
    }

    private static DimensionlessCase smallCase(int particles, int maxParticles, double target) {
        SpectrumTable table = new SpectrumTable(new PowerLawBand(-5.0 / 3.0, 16), 3, 8);
        RandomFourierModel model = new RandomFourierModel(table, 1.0, "test");
        return new DimensionlessCase(model, Integrator.STRANG, new double[] {0.01, 0.01, 0.01}, 0.05, 120, 64,
                particles, maxParticles, target, 11, new Scales(1, 1), 1, 100, List.of(), "progress");
    }

    private static List<Report> record(DimensionlessCase c, int threads) {
        List<Report> reports = new ArrayList<>();
        RunListener listener = (fraction, partial) ->
                reports.add(new Report(fraction, partial == null ? -1 : partial.count()));
        DiffusivityStudy.run(c, threads, listener, new Cancellation());
        return reports;
    }

    private static void assertMonotone(List<Report> reports) {
        for (int i = 1; i < reports.size(); i++) {
            assertTrue(reports.get(i).fraction() >= reports.get(i - 1).fraction(),
                    "progress went back at report " + i + ": " + reports);
        }
        for (Report r : reports) {
            assertTrue(r.fraction() >= 0 && r.fraction() <= 1, "fraction out of [0, 1]: " + r);
        }
    }

    @Test
    void fixedRunFractionsGrowWithMergedBlocksAndEndAtOne() {
        int blocks = 40; // batches of 16, 16 and 8 blocks
        List<Report> reports = record(smallCase(64 * blocks, 64 * blocks, Double.NaN), 2);
        assertMonotone(reports);
        assertEquals(1.0, reports.get(reports.size() - 1).fraction(), 0.0);
        List<Long> merged = new ArrayList<>();
        for (Report r : reports) {
            if (r.blocksMerged() >= 0) {
                merged.add(r.blocksMerged());
            }
        }
        assertEquals(List.of(16L, 32L, 40L), merged);
        long[] nextBatch = {16, 8, 0};
        int k = 0;
        for (Report r : reports) {
            if (r.blocksMerged() >= 0) {
                double done = (double) r.blocksMerged() / blocks;
                double running = (double) (r.blocksMerged() + nextBatch[k++]) / blocks;
                assertTrue(r.fraction() >= done - 1e-12 && r.fraction() <= running + 1e-12,
                        "at a merge: " + r + " should lie in [" + done + ", " + running + "]");
            }
        }
    }

    /**
     * With a precision target the plan is the particle budget; a run that stops early jumps to 1 only
     * through the final report, never past it, and never goes back while it adds particles.
     */
    @Test
    void targetedRunFractionsStayMonotone() {
        List<Report> reports = record(smallCase(64 * 16, 64 * 64, 1e-6), 2);
        assertMonotone(reports);
        assertEquals(1.0, reports.get(reports.size() - 1).fraction(), 0.0,
                "a run that spends its whole budget ends at 1");
    }
}
