package org.eddycast.measure;

/**
 * A one-sided power spectral density: frequencies from 0 to the Nyquist frequency in steps of
 * samplingRate / segmentLength, density in (signal units)^2 per Hz. Its integral (rectangle rule,
 * {@link #integral()}) is the signal's windowed mean square, the estimate of its variance.
 *
 * @param frequencies   frequencies (Hz), 0 to samplingRate / 2
 * @param densities     one-sided density at each frequency
 * @param samplingRate  samples per second
 * @param segmentLength samples per Welch segment (a power of two)
 * @param segmentCount  number of averaged segments
 */
public record PowerSpectrum(double[] frequencies, double[] densities, double samplingRate, int segmentLength,
                            int segmentCount) {

    public PowerSpectrum {
        frequencies = frequencies.clone();
        densities = densities.clone();
    }

    @Override
    public double[] frequencies() {
        return frequencies.clone();
    }

    @Override
    public double[] densities() {
        return densities.clone();
    }

    /** Frequency spacing (Hz). */
    public double resolution() {
        return samplingRate / segmentLength;
    }

    /** Sum of density times frequency spacing over all frequencies: the variance the spectrum holds. */
    public double integral() {
        double sum = 0;
        for (double d : densities) {
            sum += d;
        }
        return sum * resolution();
    }

    double[] frequenciesView() {
        return frequencies;
    }

    double[] densitiesView() {
        return densities;
    }
}
