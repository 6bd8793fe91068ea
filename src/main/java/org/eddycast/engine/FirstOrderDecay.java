package org.eddycast.engine;

import java.util.ArrayList;
import java.util.List;
import org.eddycast.forecast.Forecast;
import org.eddycast.scenario.FirstOrderLoss;
import org.eddycast.transport.StationCurve;

/**
 * A first-order loss applied to a forecast already made for a conservative tracer. Spreading and loss are
 * independent for a loss rate the same everywhere: the concentration of the decaying tracer is that of the
 * conservative one times exp(-k t), t the time since the release (the solution of dc/dt = -k c; the product form
 * holds for any linear advection-diffusion: Crank 1975, The Mathematics of Diffusion, 2nd ed., Oxford, ch. 14 on
 * diffusion with an irreversible first-order reaction, from memory).
 * So widths, blend times and distances to mixed stay as they were (a blend criterion is relative to the mean,
 * which decays alike); every concentration is multiplied, and a peak over time is read again from the decayed
 * curve, which moves it earlier.
 */
final class FirstOrderDecay {

    /** The assumption line of a conservative tracer, replaced by the loss's own line when there is a loss. */
    static final String CONSERVATIVE = "a passive, conservative tracer: it neither decays, settles nor changes the"
            + " flow";

    private FirstOrderDecay() {
    }

    /** The line a forecast with this loss states among its assumptions. */
    static String assumption(FirstOrderLoss loss) {
        return "first-order loss at k = " + ForecastBuilder.fmt(loss.rate()) + " 1/s (half-life "
                + ForecastBuilder.fmt(loss.halfLife()) + " s), applied to every concentration as exp(-k t), t the"
                + " time since the release; the spreading itself is unchanged, and so are the widths, the blend"
                + " times and the distances to mixed";
    }

    /** The forecast with its concentrations decayed: the peaks over the grid and the continuous plume's. */
    static Forecast apply(Forecast f, FirstOrderLoss loss) {
        if (f == null || !loss.present()) {
            return f;
        }
        double[] times = f.times();
        double[] peak = f.peakConcentration();
        for (int j = 0; j < peak.length; j++) {
            peak[j] *= loss.remaining(times[j]);
        }
        double[] plume = f.plumeConcentration();
        // a continuous plume at grid distance x is water that left the source x / U = times[j] ago
        for (int j = 0; j < plume.length; j++) {
            plume[j] *= loss.remaining(times[j]);
        }
        List<String> assumptions = new ArrayList<>();
        for (String a : f.assumptions()) {
            // the rules' own lines say "conservative" too: with a loss the tracer is passive, not conservative
            assumptions.add(a.equals(CONSERVATIVE) ? "a passive tracer: it neither settles nor changes the flow"
                    : a.replace("passive, conservative tracer", "passive tracer"));
        }
        assumptions.add(assumption(loss));
        return new Forecast(f.inDistance(), f.grid(), times, f.measure(), f.edgeFraction(), f.width(),
                f.widthLow(), f.widthHigh(), f.simulatedUntil(), peak, f.mixing(), f.handbook(), assumptions,
                f.cautions(), plume);
    }

    /** Station curves with every value decayed at its record time. */
    static List<StationCurve> apply(List<StationCurve> curves, FirstOrderLoss loss) {
        if (!loss.present()) {
            return curves;
        }
        return curves.stream().map(c -> c.decayed(loss.rate())).toList();
    }
}
