package org.eddycast.transport;

/**
 * A station curve for a release at a constant rate over a duration T from the slug's curve: by superposition
 * (the transport is linear in the mass), mass M going in at M / T per second gives
 * C_T(t) = (1 / T) * integral from max(0, t - T) to t of C_slug(u) du, the slug's curve averaged over a sliding
 * window of length T; for a Gaussian passage curve this is a difference of error functions, the same form as an
 * initial slab of finite width (Crank 1975, The Mathematics of Diffusion, 2nd ed., sec. 2.2).
 *
 * <p>The slug's curve is taken as piecewise linear through its records, rising from zero at the release, and
 * zero after its last record (the run lasts until the cloud has passed the furthest station); the window's
 * curve runs on for T past the last record, at the records' last spacing. The band and the one-particle
 * resolution are averaged alike (a band averaged so is a little wide: the averaging also averages the noise).
 */
public final class SlidingWindow {

    private SlidingWindow() {
    }

    /** The curve of a release spread evenly over {@code duration} seconds, from the slug's curve. */
    public static StationCurve of(StationCurve slug, double duration) {
        double[] t = slug.times();
        int n = t.length;
        double step = n > 1 ? t[n - 1] - t[n - 2] : t[n - 1];
        int extra = (int) Math.ceil(duration / step);
        double[] times = new double[n + extra];
        System.arraycopy(t, 0, times, 0, n);
        for (int m = 1; m <= extra; m++) {
            times[n - 1 + m] = t[n - 1] + m * step;
        }
        double[] bin = new double[times.length];
        double[] slugBin = slug.binWidth();
        for (int j = 0; j < times.length; j++) {
            bin[j] = slugBin[Math.min(j, n - 1)];
        }
        return new StationCurve(slug.distance(), slug.across(), times,
                average(t, slug.concentration(), times, duration), average(t, slug.low(), times, duration),
                average(t, slug.high(), times, duration), bin, average(t, slug.oneParticle(), times, duration));
    }

    /** (1/T) times the integral of the piecewise-linear curve over [t - T, t] at each output time. */
    static double[] average(double[] t, double[] c, double[] at, double duration) {
        // cumulative integral at the knots: (0, 0), then each record
        double[] knots = new double[t.length + 1];
        double[] values = new double[t.length + 1];
        double[] cumulative = new double[t.length + 1];
        System.arraycopy(t, 0, knots, 1, t.length);
        System.arraycopy(c, 0, values, 1, c.length);
        for (int i = 1; i < knots.length; i++) {
            cumulative[i] = cumulative[i - 1] + 0.5 * (values[i] + values[i - 1]) * (knots[i] - knots[i - 1]);
        }
        double[] out = new double[at.length];
        for (int j = 0; j < at.length; j++) {
            out[j] = (integral(knots, values, cumulative, at[j])
                    - integral(knots, values, cumulative, at[j] - duration)) / duration;
        }
        return out;
    }

    /** The integral of the curve from 0 to u (zero before the release, constant after the last record). */
    private static double integral(double[] knots, double[] values, double[] cumulative, double u) {
        if (u <= 0) {
            return 0;
        }
        int last = knots.length - 1;
        if (u >= knots[last]) {
            return cumulative[last];
        }
        int lo = 0;
        int hi = last;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (knots[mid] <= u) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        double h = knots[hi] - knots[lo];
        double f = (u - knots[lo]) / h;
        double at = values[lo] + f * (values[hi] - values[lo]);
        return cumulative[lo] + 0.5 * (values[lo] + at) * (u - knots[lo]);
    }
}
