package org.eddycast.transport;

import java.util.List;

/**
 * What the transport stage found in a stirred tank, in SI units.
 *
 * @param times             record times (s)
 * @param coefficientOfVariation the tank's coefficient of variation over its cells at each record (counting noise
 *                          removed)
 * @param variance          the cloud's variance along x, y and z at each record (m^2)
 * @param peakFactor        the largest concentration over the cells over the final value, at each record
 * @param blendTimes        the time until every cell is within 10%, 5% and 1% of the final value (s), in the order
 *                          of {@link #LEVELS}
 * @param probes            the virtual probes
 * @param loopFlow          the flow carried round each circulation loop (m^3/s)
 * @param discharge         the impeller's discharge N_Q N D^3 (m^3/s)
 * @param circulationTime   V over the impeller discharge (s)
 * @param meanDiffusivity   the volume mean of the turbulent diffusivity (m^2/s)
 * @param velocityGradient  G = sqrt(P / (mu V)) (1/s)
 * @param particles         particles followed
 * @param blocks            independent blocks
 * @param steps             time steps
 * @param timeStep          time step (s)
 * @param elapsedSeconds    wall time of the stage
 * @param warnings          what the user must know
 * @param notes             how the stage was set up
 */
public record TankStageResult(double[] times, double[] coefficientOfVariation, double[][] variance,
                              double[] peakFactor, List<Estimate> blendTimes,
                              List<Probe> probes, double loopFlow, double discharge, double circulationTime,
                              double meanDiffusivity, double velocityGradient, long particles, int blocks,
                              long steps, double timeStep, double elapsedSeconds, List<String> warnings,
                              List<String> notes) implements TransportResult {

    /** The blend levels: 90%, 95% and 99%. */
    public static final double[] LEVELS = {0.90, 0.95, 0.99};

    /**
     * A virtual probe: a small sphere at a point.
     *
     * @param name          where it is, in words
     * @param position      x, y from the axis and z from the bottom (m)
     * @param radius        the sphere's radius (m)
     * @param concentration the reading over the final (fully mixed) value at each record
     * @param low           low end of the reading's 95% band at each record
     * @param high          high end of the reading's 95% band at each record
     * @param blendTimes    the time until the reading stays within 10%, 5% and 1% of its final value (s)
     */
    public record Probe(String name, double[] position, double radius, double[] concentration, double[] low,
                        double[] high, List<Estimate> blendTimes) {

        public Probe {
            position = position.clone();
            concentration = concentration.clone();
            low = low.clone();
            high = high.clone();
            blendTimes = List.copyOf(blendTimes);
        }
    }

    public TankStageResult {
        times = times.clone();
        coefficientOfVariation = coefficientOfVariation.clone();
        variance = new double[][] {variance[0].clone(), variance[1].clone(), variance[2].clone()};
        peakFactor = peakFactor.clone();
        blendTimes = List.copyOf(blendTimes);
        probes = List.copyOf(probes);
        warnings = List.copyOf(warnings);
        notes = List.copyOf(notes);
    }

    @Override
    public double[] times() {
        return times.clone();
    }

    @Override
    public double[] coefficientOfVariation() {
        return coefficientOfVariation.clone();
    }

    @Override
    public double[][] variance() {
        return new double[][] {variance[0].clone(), variance[1].clone(), variance[2].clone()};
    }

    @Override
    public double[] peakFactor() {
        return peakFactor.clone();
    }

    /** The 95% blend time (s). */
    public Estimate blendTime95() {
        return blendTimes.get(1);
    }
}
