package org.eddycast.engine;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.special.Erf;
import org.eddycast.forecast.Forecast;
import org.eddycast.scenario.Release;
import org.eddycast.transport.SlidingWindow;
import org.eddycast.transport.StationCurve;

/**
 * A channel release at a constant rate over a stated duration T, from the forecast of the same mass at once.
 * Station curves: the slug's curve averaged over a sliding window of length T ({@link SlidingWindow}). The peaks
 * along the forecast grid: the cloud is the slug's Gaussian along the channel (standard deviation sigma) spread
 * over a length L = U T, whose peak is the slug's times sqrt(2 pi) sigma / L * erf(L / (2 sqrt 2 sigma)) (the
 * centre of a Gaussian smoothed by a box: Crank 1975, The Mathematics of Diffusion, 2nd ed., sec. 2.2, the slab of
 * finite width). They count the whole mass as released, an upper bound while the release still goes on.
 */
final class ReleaseOverDuration {

    private ReleaseOverDuration() {
    }

    /** The stations' curves of the release, from the slug's (unchanged for a slug or a continuous release). */
    static List<StationCurve> curves(List<StationCurve> slug, Release release) {
        if (!release.mode().equals(Release.OVER_DURATION)) {
            return slug;
        }
        return slug.stream().map(c -> SlidingWindow.of(c, release.duration())).toList();
    }

    /** The peak of a Gaussian of standard deviation sigma smoothed by a box of length L, over the Gaussian's. */
    static double boxFactor(double sigma, double length) {
        if (length <= 0) {
            return 1;
        }
        if (sigma <= 0) {
            return 0;
        }
        double z = length / (2 * Math.sqrt(2) * sigma);
        // for short boxes erf(z)/z tends to 2/sqrt(pi): the series keeps the ratio exact there
        double erfOverZ = z < 1e-4 ? 2 / Math.sqrt(Math.PI) * (1 - z * z / 3) : Erf.erf(z) / z;
        return Math.sqrt(2 * Math.PI) * sigma / length * z * erfOverZ;
    }

    /** The forecast with the peaks along the grid of a channel release over its duration. */
    static Forecast apply(Forecast f, Release release) {
        if (f == null || !f.inDistance() || !release.mode().equals(Release.OVER_DURATION)) {
            return f;
        }
        double[] grid = f.grid();
        double[] times = f.times();
        double[] sigmaX = f.width()[0];
        double factor = f.widthFactor();
        double[] peak = f.peakConcentration();
        double u = grid[grid.length - 1] / times[times.length - 1];
        double length = u * release.duration();
        for (int j = 0; j < peak.length; j++) {
            peak[j] *= boxFactor(sigmaX[j] / factor, length);
        }
        List<String> assumptions = new ArrayList<>(f.assumptions());
        assumptions.add("release at a constant rate over " + ForecastBuilder.fmt(release.duration()) + " s ("
                + ForecastBuilder.fmt(release.mass() / release.duration()) + " kg/s): station curves are the slug's"
                + " averaged over a sliding window of that length; the peaks along the grid are the slug's cloud"
                + " spread over U T = " + ForecastBuilder.fmt(length) + " m, counting the whole mass as released");
        return new Forecast(f.inDistance(), grid, times, f.measure(), f.edgeFraction(), f.width(), f.widthLow(),
                f.widthHigh(), f.simulatedUntil(), peak, f.mixing(), f.handbook(), assumptions, f.cautions(),
                f.plumeConcentration());
    }
}
