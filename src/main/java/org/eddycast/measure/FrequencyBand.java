package org.eddycast.measure;

/**
 * A closed frequency band [low, high] in Hz, for a caller-chosen inertial-range fit.
 *
 * @param low  lower end (Hz), positive
 * @param high upper end (Hz), above {@code low}
 */
public record FrequencyBand(double low, double high) {

    public FrequencyBand {
        if (!(low > 0) || !Double.isFinite(low)) {
            throw new IllegalArgumentException("fit band: lower frequency must be positive (Hz), not " + low);
        }
        if (!(high > low) || !Double.isFinite(high)) {
            throw new IllegalArgumentException("fit band: upper frequency must be finite and above the lower one ("
                    + low + " Hz), not " + high);
        }
    }

    public boolean contains(double f) {
        return f >= low && f <= high;
    }
}
