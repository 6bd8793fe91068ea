package org.eddycast.field;

import java.util.Locale;

/**
 * A power-law band spectrum: E(k) proportional to k^slope for 1 &lt;= k &lt;= ratio, zero outside.
 * With slope -5/3 this is the inertial range of Kolmogorov (1941) cut off at both ends.
 */
public final class PowerLawBand implements SpectrumShape {

    private final double slope;
    private final double ratio;

    /**
     * @param slope the exponent, between -10 and 10
     * @param ratio largest over smallest wavenumber, at least 1 (1 gives a single wavenumber shell)
     */
    /** The widest band the field samples: six decades of wavenumber. */
    public static final double MAX_RATIO = 1e6;

    public PowerLawBand(double slope, double ratio) {
        if (!(slope >= -10 && slope <= 10)) {
            throw new IllegalArgumentException("spectrum slope must be between -10 and 10; got " + slope);
        }
        if (!(ratio >= 1 && ratio <= MAX_RATIO)) {
            throw new IllegalArgumentException("wavenumber ratio must be between 1 and 1e6; got " + ratio);
        }
        this.slope = slope;
        this.ratio = ratio;
    }

    public double slope() {
        return slope;
    }

    public double ratio() {
        return ratio;
    }

    @Override
    public double density(double k) {
        return k < 1 || k > ratio ? 0.0 : Math.pow(k, slope);
    }

    @Override
    public double lowerWavenumber() {
        return 1.0;
    }

    @Override
    public double upperWavenumber() {
        return ratio;
    }

    @Override
    public String describe() {
        return String.format(Locale.ROOT, "power law k^%.4g over a wavenumber band of ratio %.4g", slope, ratio);
    }
}
