package org.eddycast.transport;

import java.util.List;

/**
 * What the transport stage found in a channel, in SI units.
 *
 * @param times                  record times (s)
 * @param variance               the cloud's variance per axis (x along, y across, z vertical) at each record (m^2)
 * @param skewness               the along-flow skewness at each record
 * @param sectionPeakFactor      the largest concentration in the section over the section mean, at each record
 *                               (counting noise removed; 1 once mixed)
 * @param longitudinalDispersion K_L (m^2/s), interval over blocks and the field factor's interval
 * @param transverseDiffusivity  section mean of K_yy (m^2/s)
 * @param verticalDiffusivity    section mean of K_zz (m^2/s)
 * @param timeToMixedWidth       time until every strip across holds its share within 5% (s)
 * @param timeToMixedDepth       time until every layer over the depth holds its share within 5% (s)
 * @param meanVelocity           U (m/s)
 * @param area                   flow area (m^2)
 * @param windowStart            start of the window K_L is fitted over (s)
 * @param particles              particles followed
 * @param blocks                 independent blocks
 * @param steps                  time steps
 * @param timeStep               time step (s)
 * @param elapsedSeconds         wall time of the stage
 * @param warnings               what the user must know
 * @param notes                  how the stage was set up
 * @param stations               the concentration against time at each station asked about, for a release of
 *                               1 kg (concentrations scale with the mass)
 */
public record ChannelStageResult(double[] times, double[][] variance, double[] skewness, double[] sectionPeakFactor,
                                 Estimate longitudinalDispersion, Estimate transverseDiffusivity,
                                 Estimate verticalDiffusivity, Estimate timeToMixedWidth,
                                 Estimate timeToMixedDepth, double meanVelocity, double area, double windowStart,
                                 long particles, int blocks, long steps, double timeStep, double elapsedSeconds,
                                 List<String> warnings, List<String> notes, List<StationCurve> stations)
        implements TransportResult {

    public ChannelStageResult {
        times = times.clone();
        variance = new double[][] {variance[0].clone(), variance[1].clone(), variance[2].clone()};
        skewness = skewness.clone();
        sectionPeakFactor = sectionPeakFactor.clone();
        warnings = List.copyOf(warnings);
        notes = List.copyOf(notes);
        stations = stations == null ? List.of() : List.copyOf(stations);
    }

    @Override
    public double[] times() {
        return times.clone();
    }

    @Override
    public double[][] variance() {
        return new double[][] {variance[0].clone(), variance[1].clone(), variance[2].clone()};
    }

    @Override
    public double[] skewness() {
        return skewness.clone();
    }

    @Override
    public double[] sectionPeakFactor() {
        return sectionPeakFactor.clone();
    }

    /** Distance to mixed across the width (m): U times the time. */
    public Estimate distanceToMixedWidth() {
        return timeToMixedWidth.times(meanVelocity);
    }

    /** Distance to mixed over the depth (m). */
    public Estimate distanceToMixedDepth() {
        return timeToMixedDepth.times(meanVelocity);
    }

    /** Simulated duration (s). */
    public double duration() {
        return times[times.length - 1];
    }
}
