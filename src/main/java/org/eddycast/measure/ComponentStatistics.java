package org.eddycast.measure;

/**
 * Single-point statistics of one cleaned velocity component.
 *
 * @param component name as written in the header
 * @param mean      mean velocity (m/s)
 * @param rms       rms of the fluctuation, sample standard deviation (m/s)
 * @param intensity rms divided by the mean speed of the record (infinite when the mean speed is 0)
 */
public record ComponentStatistics(String component, double mean, double rms, double intensity) {
}
