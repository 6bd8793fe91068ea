package org.eddycast.engine;

import java.util.LinkedHashMap;
import java.util.Map;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;

/**
 * Simulations kept by their dimensionless case, so that design options sharing Kubo number, Peclet number,
 * spectrum and simulation settings are simulated once; a reused result is rescaled to the option's units and
 * says it was reused. Holds the few most recent results (their memory is bounded by the record count, not by
 * the particles).
 */
public final class SimulationCache {

    private static final int CAPACITY = 16;
    private static final SimulationCache SHARED = new SimulationCache();

    private final Map<String, DiffusivityResult> results = new LinkedHashMap<>(16, 0.75f, true) {
        @Override
        protected boolean removeEldestEntry(Map.Entry<String, DiffusivityResult> eldest) {
            return size() > CAPACITY;
        }
    };

    /** The cache the engine uses. */
    public static SimulationCache shared() {
        return SHARED;
    }

    /** The result of the case, simulated now or reused. */
    public DiffusivityResult run(DimensionlessCase c, int threads, RunListener listener, Cancellation cancel) {
        DiffusivityResult cached;
        synchronized (results) {
            cached = results.get(c.key());
        }
        if (cached != null) {
            listener.progress(1.0, cached.moments());
            return cached.rescaled(c.scales(), c.notes());
        }
        DiffusivityResult fresh = DiffusivityStudy.run(c, threads, listener, cancel);
        synchronized (results) {
            results.put(c.key(), fresh);
        }
        return fresh;
    }

    /** Forgets every result. */
    public void clear() {
        synchronized (results) {
            results.clear();
        }
    }
}
