package org.eddycast.measure;

import java.util.Locale;

/**
 * What cleaning changed in one velocity component.
 *
 * @param component       the component's name as written in the header
 * @param despiked        true when despiking ran on this component
 * @param spikeSamples    indices (from 0) of the replaced samples, ascending
 * @param spikeLines      file lines of the replaced samples, in the same order
 * @param despikePasses   passes of the phase-space test (0 when despiking was off)
 * @param despikeConverged false when the despiking stopped at its pass limit with spikes still being found
 * @param detrended       true when a linear trend was removed
 * @param trendSlope      the removed slope (m/s per s); 0 when not detrended
 * @param trendChange     the removed change from first to last sample, slope times record duration (m/s)
 * @param sampleCount     samples in the component
 */
public record ComponentCleaning(String component, boolean despiked, int[] spikeSamples, int[] spikeLines,
                                int despikePasses, boolean despikeConverged, boolean detrended, double trendSlope,
                                double trendChange, int sampleCount) {

    public ComponentCleaning {
        spikeSamples = spikeSamples.clone();
        spikeLines = spikeLines.clone();
    }

    @Override
    public int[] spikeSamples() {
        return spikeSamples.clone();
    }

    @Override
    public int[] spikeLines() {
        return spikeLines.clone();
    }

    /** The fraction of samples replaced as spikes. */
    public double replacedFraction() {
        return sampleCount == 0 ? 0 : (double) spikeSamples.length / sampleCount;
    }

    /** The changes in words, one line per step. */
    public String describe() {
        StringBuilder s = new StringBuilder();
        if (despiked) {
            s.append(String.format(Locale.ROOT, "%s: %d of %d samples (%.3f%%) replaced as spikes after %d passes",
                    component, spikeSamples.length, sampleCount, 100 * replacedFraction(), despikePasses));
            if (spikeLines.length > 0) {
                s.append(", lines ").append(listLines(spikeLines, 20));
            }
            if (!despikeConverged) {
                s.append(" (stopped at the pass limit; more spikes may remain)");
            }
        } else {
            s.append(component).append(": despiking switched off");
        }
        s.append('\n');
        if (detrended) {
            s.append(String.format(Locale.ROOT, "%s: linear trend removed, slope %.4g m/s per s"
                    + " (%.4g m/s over the record), mean kept", component, trendSlope, trendChange));
        } else {
            s.append(component).append(": detrending switched off");
        }
        return s.toString();
    }

    private static String listLines(int[] lines, int max) {
        StringBuilder s = new StringBuilder();
        for (int i = 0; i < Math.min(lines.length, max); i++) {
            s.append(i == 0 ? "" : ", ").append(lines[i]);
        }
        if (lines.length > max) {
            s.append(" and ").append(lines.length - max).append(" more");
        }
        return s.toString();
    }
}
