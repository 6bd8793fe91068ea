package org.eddycast.scenario;

import java.util.List;

/**
 * The scenario's uncertain inputs and how many runs may be spent on them. A scenario without ranges runs once,
 * as it always did.
 *
 * @param ranges      the ranged inputs, in the order the user gave them (at most {@link #MAX_INPUTS})
 * @param baseSamples N, the base sample of Saltelli's design: the sweep makes N (k + 2) runs for k inputs
 * @param particles   particles each sampled run follows in the field stage (the transport stage takes its own
 *                    share of them by its usual rule)
 */
public record UncertaintySettings(List<InputRange> ranges, int baseSamples, int particles) {

    /** The most inputs one scenario may range. */
    public static final int MAX_INPUTS = 12;
    /** The base sample when none is given: enough to rank a few inputs, few enough for one machine. */
    public static final int DEFAULT_BASE_SAMPLES = 8;
    /** Particles per sampled run when none are given. */
    public static final int DEFAULT_PARTICLES = 4096;

    public UncertaintySettings {
        ranges = List.copyOf(ranges);
    }

    /** No ranged inputs. */
    public static UncertaintySettings none() {
        return new UncertaintySettings(List.of(), DEFAULT_BASE_SAMPLES, DEFAULT_PARTICLES);
    }

    /** True when at least one input carries a range. */
    public boolean ranged() {
        return !ranges.isEmpty();
    }

    /** Runs the design makes: N (k + 2). */
    public long runs() {
        return (long) baseSamples * (ranges.size() + 2);
    }
}
