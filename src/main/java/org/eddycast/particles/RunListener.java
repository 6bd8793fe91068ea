package org.eddycast.particles;

import org.eddycast.stats.DisplacementMoments;

/** Progress of an ensemble run, reported from the thread that called {@link EnsembleRunner#run}. */
@FunctionalInterface
public interface RunListener {

    /**
     * @param fraction  work done so far, 0 to 1
     * @param partial   a snapshot of the blocks merged so far (null between merges)
     */
    void progress(double fraction, DisplacementMoments partial);

    /** A listener that ignores everything. */
    RunListener NONE = (fraction, partial) -> { };
}
