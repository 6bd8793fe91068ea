package org.eddycast.cli;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eddycast.engine.Benchmark;
import org.eddycast.engine.DimensionlessCase;
import org.eddycast.field.ModeLanes;
import org.eddycast.particles.EnsembleRunner;
import org.eddycast.particles.Integrator;
import org.junit.jupiter.api.Test;

/** The stated memory bound counts what each worker holds for the way the particles share realizations. */
class MemoryBoundTest {

    @Test
    void oneRealizationPerParticleAddsEachWorkersLanes() {
        Benchmark.Workload w = new Benchmark.Workload(4096, 400, 64, 1);
        DimensionlessCase shared = Benchmark.workload(w, Integrator.LIE, 64, 1);
        DimensionlessCase own = Benchmark.workload(w, Integrator.LIE, 1, 1);
        int workers = 2;
        long lanes = 8 * ModeLanes.doublesFor(64, EnsembleRunner.blockSizeFor(1));
        long extra = MemoryCommand.boundBytes(own, workers) - MemoryCommand.boundBytes(shared, workers);
        assertTrue(extra >= workers * lanes,
                "own realizations add " + extra + " bytes to the bound; the lanes alone take " + workers * lanes);
    }
}
