package org.eddycast.measure;

/**
 * A time step in a record well above the median step: samples are probably missing there.
 *
 * @param line           line number of the first sample after the gap
 * @param previousLine   line number of the last sample before the gap
 * @param startTime      time of the last sample before the gap (s)
 * @param duration       the time step across the gap (s)
 * @param missingSamples about how many samples are missing: round(duration / median step) - 1
 */
public record SamplingGap(int line, int previousLine, double startTime, double duration, long missingSamples) {

    /** The gap in words, for reports. */
    public String describe() {
        return String.format(java.util.Locale.ROOT,
                "gap of %.4g s after t = %.4g s between lines %d and %d (about %d samples missing)",
                duration, startTime, previousLine, line, missingSamples);
    }
}
