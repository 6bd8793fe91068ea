package org.eddycast.engine;

import java.util.ArrayList;
import java.util.List;
import org.eddycast.forecast.Forecast;
import org.eddycast.scenario.Release;

/**
 * No mixture is stronger than the solution injected: where a release states the volume of its solution, every
 * forecast concentration (the peaks over the grid and the continuous plume's) is held at most at its
 * concentration M / V. Close to a point release the point-source formulas exceed it; the cap is the simplest
 * bound that is certainly true, and an assumption line says where it applied.
 */
final class StockCap {

    private StockCap() {
    }

    static Forecast apply(Forecast f, Release release) {
        double stock = release.stockConcentration();
        if (f == null || !Double.isFinite(stock)) {
            return f;
        }
        double[] grid = f.grid();
        double[] peak = f.peakConcentration();
        double[] plume = f.plumeConcentration();
        int cappedPeaks = cap(peak, stock);
        int cappedPlume = cap(plume, stock);
        List<String> assumptions = new ArrayList<>(f.assumptions());
        String where = f.inDistance() ? "m" : "s";
        if (cappedPeaks > 0) {
            assumptions.add(String.format(java.util.Locale.ROOT, "the injected solution's concentration M / V ="
                    + " %.4g kg/m^3 capped the peak concentration at the first %d grid points (up to %.4g %s)",
                    stock, cappedPeaks, grid[cappedPeaks - 1], where));
        }
        if (cappedPlume > 0) {
            assumptions.add(String.format(java.util.Locale.ROOT, "the injected solution's concentration M / V ="
                    + " %.4g kg/m^3 capped the continuous plume's peak at %d grid points", stock, cappedPlume));
        }
        return new Forecast(f.inDistance(), grid, f.times(), f.measure(), f.edgeFraction(), f.width(),
                f.widthLow(), f.widthHigh(), f.simulatedUntil(), peak, f.mixing(), f.handbook(), assumptions,
                f.cautions(), plume);
    }

    /** Caps in place; returns how many values were capped. */
    private static int cap(double[] values, double stock) {
        int n = 0;
        for (int j = 0; j < values.length; j++) {
            if (values[j] > stock) {
                values[j] = stock;
                n++;
            }
        }
        return n;
    }
}
