package org.eddycast.propagation;

import java.util.List;

/**
 * The responses of some consecutive rows of a sweep's design: what one shard writes, and what merging reads.
 *
 * @param fingerprint identifies the scenario and its ranges: parts merge only with parts of the same sweep
 * @param scenario    the scenario swept, as scenario-file text: merging needs nothing else
 * @param baseSamples N of the design
 * @param inputs      the ranged inputs, in column order
 * @param figures     the figures' keys, in response order
 * @param rows        the design's total number of rows
 * @param from        the first row this part holds
 * @param responses   one array of figure values per row held ({@code responses.length} rows from {@code from});
 *                    NaN where a run did not determine a figure
 * @param halfWidths  the 95% Monte Carlo half-width of each of those values, NaN where a figure has none
 */
public record SweepPart(String fingerprint, String scenario, int baseSamples, List<String> inputs, List<String> figures, int rows,
                        int from, double[][] responses, double[][] halfWidths) {

    public SweepPart {
        inputs = List.copyOf(inputs);
        figures = List.copyOf(figures);
        double[][] copy = new double[responses.length][];
        for (int i = 0; i < responses.length; i++) {
            copy[i] = responses[i].clone();
        }
        responses = copy;
        double[][] widths = new double[halfWidths.length][];
        for (int i = 0; i < halfWidths.length; i++) {
            widths[i] = halfWidths[i].clone();
        }
        halfWidths = widths;
        if (halfWidths.length != responses.length) {
            throw new IllegalArgumentException(responses.length + " rows of responses but " + halfWidths.length
                    + " of half-widths");
        }
    }

    /** One past the last row held. */
    public int to() {
        return from + responses.length;
    }
}
