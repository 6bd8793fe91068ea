package org.eddycast.measure;

import java.util.ArrayList;
import java.util.List;

/**
 * A probe velocity record as read: sample times, one to three velocity components in metres per second,
 * the file line each sample came from, the sampling rate and any gaps.
 *
 * <p>Immutable: arrays are copied on the way in and out. The sampling rate is the reciprocal of the median
 * time step (or the stated rate when the record has no time column); the analysis treats the samples as
 * evenly spaced at that rate, which is why gaps are reported.
 */
public final class VelocityRecord {

    private final String source;
    private final double[] times;
    private final double[][] velocities;
    private final List<String> componentNames;
    private final int[] lineNumbers;
    private final double samplingRate;
    private final boolean timeColumn;
    private final List<SamplingGap> gaps;
    private final List<String> notes;

    /**
     * @param source         where the record came from, for messages (a file name, or a description)
     * @param times          sample times (s), strictly increasing
     * @param velocities     velocities (m/s), indexed [component][sample]; 1 to 3 components
     * @param componentNames one name per component, as written in the header
     * @param lineNumbers    the file line of each sample (1-based)
     * @param samplingRate   samples per second
     * @param timeColumn     true when times were read from a column, false when made from a stated rate
     * @param gaps           time steps well above the median
     * @param notes          assumptions made while reading (units assumed, columns not used)
     */
    public VelocityRecord(String source, double[] times, double[][] velocities, List<String> componentNames,
                          int[] lineNumbers, double samplingRate, boolean timeColumn, List<SamplingGap> gaps,
                          List<String> notes) {
        int n = times.length;
        if (velocities.length < 1 || velocities.length > 3) {
            throw new IllegalArgumentException("a record holds 1 to 3 velocity components, not " + velocities.length);
        }
        if (componentNames.size() != velocities.length) {
            throw new IllegalArgumentException("one name per component is needed: " + velocities.length
                    + " components, " + componentNames.size() + " names");
        }
        if (lineNumbers.length != n) {
            throw new IllegalArgumentException("one line number per sample is needed: " + n + " samples, "
                    + lineNumbers.length + " line numbers");
        }
        if (!(samplingRate > 0) || Double.isInfinite(samplingRate)) {
            throw new IllegalArgumentException("sampling rate must be positive and finite, not " + samplingRate);
        }
        this.velocities = new double[velocities.length][];
        for (int c = 0; c < velocities.length; c++) {
            if (velocities[c].length != n) {
                throw new IllegalArgumentException("component " + (c + 1) + " has " + velocities[c].length
                        + " samples, the time axis " + n);
            }
            this.velocities[c] = velocities[c].clone();
        }
        this.source = source;
        this.times = times.clone();
        this.componentNames = List.copyOf(componentNames);
        this.lineNumbers = lineNumbers.clone();
        this.samplingRate = samplingRate;
        this.timeColumn = timeColumn;
        this.gaps = List.copyOf(gaps);
        this.notes = List.copyOf(notes);
    }

    /** The same record with other velocities (same shape), for example after cleaning. */
    public VelocityRecord withVelocities(double[][] newVelocities) {
        return new VelocityRecord(source, times, newVelocities, componentNames, lineNumbers, samplingRate,
                timeColumn, gaps, notes);
    }

    /** The same record with notes added. */
    public VelocityRecord withNotes(List<String> moreNotes) {
        List<String> all = new ArrayList<>(notes);
        all.addAll(moreNotes);
        return new VelocityRecord(source, times, velocities, componentNames, lineNumbers, samplingRate,
                timeColumn, gaps, all);
    }

    public String source() {
        return source;
    }

    public int sampleCount() {
        return times.length;
    }

    public int componentCount() {
        return velocities.length;
    }

    /** Sample times (s), a copy. */
    public double[] times() {
        return times.clone();
    }

    /** One velocity component (m/s), a copy; {@code index} from 0. */
    public double[] component(int index) {
        return velocities[index].clone();
    }

    /** All components (m/s), indexed [component][sample], a deep copy. */
    public double[][] velocities() {
        double[][] copy = new double[velocities.length][];
        for (int c = 0; c < velocities.length; c++) {
            copy[c] = velocities[c].clone();
        }
        return copy;
    }

    public List<String> componentNames() {
        return componentNames;
    }

    /** The file line each sample came from (1-based), a copy. */
    public int[] lineNumbers() {
        return lineNumbers.clone();
    }

    /** The file line of one sample. */
    public int lineOf(int sample) {
        return lineNumbers[sample];
    }

    /** Samples per second. */
    public double samplingRate() {
        return samplingRate;
    }

    /** True when the times came from a time column; false when they were made from a stated sampling rate. */
    public boolean hasTimeColumn() {
        return timeColumn;
    }

    public List<SamplingGap> gaps() {
        return gaps;
    }

    /** Assumptions made while reading. */
    public List<String> notes() {
        return notes;
    }

    /** Package-private view without copying, for the analysis. */
    double[] componentView(int index) {
        return velocities[index];
    }

    double[] timesView() {
        return times;
    }
}
