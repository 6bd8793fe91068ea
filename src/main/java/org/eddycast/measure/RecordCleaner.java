package org.eddycast.measure;

import java.util.ArrayList;
import java.util.List;

/**
 * Cleans a velocity record component by component: despiking ({@link PhaseSpaceDespiker}) first, then removal
 * of a linear trend ({@link LinearDetrender}). Despiking comes first so that spikes do not tilt the fitted
 * trend. Each step can be switched off; the report lists what each step changed.
 */
public final class RecordCleaner {

    /**
     * The cleaned record and what was changed.
     *
     * @param record the cleaned record (same times and lines)
     * @param report what was changed
     */
    public record Result(VelocityRecord record, CleaningReport report) {
    }

    private final boolean despike;
    private final boolean detrend;
    private final boolean spareSpikeNeighbours;

    /**
     * @param despike              run the phase-space despiking
     * @param detrend              remove a linear trend
     * @param spareSpikeNeighbours the despiker's neighbour-sparing rule (see {@link PhaseSpaceDespiker})
     */
    public RecordCleaner(boolean despike, boolean detrend, boolean spareSpikeNeighbours) {
        this.despike = despike;
        this.detrend = detrend;
        this.spareSpikeNeighbours = spareSpikeNeighbours;
    }

    /** Cleans every component of the record. */
    public Result clean(VelocityRecord record) {
        int components = record.componentCount();
        double[][] cleaned = new double[components][];
        List<ComponentCleaning> entries = new ArrayList<>();
        PhaseSpaceDespiker despiker = new PhaseSpaceDespiker(spareSpikeNeighbours);
        double[] times = record.timesView();
        double duration = times[times.length - 1] - times[0];
        for (int c = 0; c < components; c++) {
            double[] x = record.component(c);
            int[] spikes = new int[0];
            int passes = 0;
            boolean converged = true;
            if (despike) {
                PhaseSpaceDespiker.Result r = despiker.despike(x);
                x = r.repaired();
                spikes = r.spikes();
                passes = r.passes();
                converged = r.converged();
            }
            int[] lines = new int[spikes.length];
            for (int k = 0; k < spikes.length; k++) {
                lines[k] = record.lineOf(spikes[k]);
            }
            double slope = 0;
            if (detrend) {
                LinearDetrender.Result r = LinearDetrender.detrend(times, x);
                x = r.detrended();
                slope = r.slope();
            }
            cleaned[c] = x;
            entries.add(new ComponentCleaning(record.componentNames().get(c), despike, spikes, lines, passes,
                    converged, detrend, slope, slope * duration, x.length));
        }
        return new Result(record.withVelocities(cleaned), new CleaningReport(entries));
    }
}
