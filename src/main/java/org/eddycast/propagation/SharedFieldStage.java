package org.eddycast.propagation;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.eddycast.engine.DiffusivityResult;
import org.eddycast.engine.DiffusivityStudy;
import org.eddycast.engine.DimensionlessCase;
import org.eddycast.engine.Engine;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;

/**
 * The field stage of a sweep's runs: runs that share a dimensionless case are simulated once. Which run is
 * simulated is fixed by the whole design, not by the runs one process makes: the first row of the design with the
 * case is simulated and every other row rescales that result. A row's result is then the same in any shard, so
 * shards merge bit for bit into the unsplit sweep.
 */
final class SharedFieldStage {

    private final List<DimensionlessCase> cases;
    private final int[] canonicalRow;
    private final int[] lastUse;
    private final Map<String, DiffusivityResult> held = new HashMap<>();
    private int simulated;

    /**
     * @param cases the dimensionless case of every row of the design
     * @param from  the first row this process runs
     * @param to    one past the last row it runs
     */
    SharedFieldStage(List<DimensionlessCase> cases, int from, int to) {
        this.cases = List.copyOf(cases);
        canonicalRow = new int[cases.size()];
        lastUse = new int[cases.size()];
        Map<String, Integer> first = new HashMap<>();
        Map<String, Integer> last = new HashMap<>();
        for (int row = 0; row < cases.size(); row++) {
            String key = cases.get(row).key();
            first.putIfAbsent(key, row);
            canonicalRow[row] = first.get(key);
            if (row >= from && row < to) {
                last.put(key, row);
            }
        }
        for (int row = 0; row < cases.size(); row++) {
            lastUse[row] = last.getOrDefault(cases.get(row).key(), -1);
        }
    }

    /** The number of field-stage simulations made so far. */
    int simulated() {
        return simulated;
    }

    /** The field stage for one row, as the engine asks for it. */
    Engine.FieldStage forRow(int row) {
        return (c, threads, listener, cancel) -> result(row, threads, listener, cancel);
    }

    private DiffusivityResult result(int row, int threads, RunListener listener, Cancellation cancel) {
        DimensionlessCase c = cases.get(row);
        String key = c.key();
        DiffusivityResult fresh = held.get(key);
        if (fresh == null) {
            fresh = DiffusivityStudy.run(cases.get(canonicalRow[row]), threads, listener, cancel);
            simulated++;
            held.put(key, fresh);
        } else {
            listener.progress(1.0, fresh.moments());
        }
        if (lastUse[row] == row) {
            held.remove(key);
        }
        return canonicalRow[row] == row ? fresh : fresh.rescaled(c.scales(), c.notes());
    }
}
