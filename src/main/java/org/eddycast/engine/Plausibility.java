package org.eddycast.engine;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.eddycast.forecast.ChannelRules;
import org.eddycast.scenario.ChannelDesign;
import org.eddycast.scenario.ChannelFlow;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.TankDesign;
import org.eddycast.scenario.TankFlow;

/**
 * Whether a design is one the rules that turn it into turbulence statistics were made for. Every value here is
 * accepted by the reader (each lies in its field's range); the combination may still describe no real tank or
 * channel, and then the statistics, and the forecast, are extrapolations. Each check gives a warning that names
 * the fields and the range the rules hold in. The ranges are common practice for stirred tanks and open
 * channels, not limits of a published fit, and are stated loosely on purpose.
 *
 * <ul>
 *   <li>Tank: the liquid covers the impeller (H &gt; D); liquid height about the tank diameter,
 *       0.5 &lt;= H/T &lt;= 2 (the blend-time correlation assumes H = T, Grenville &amp; Nienow 2004,
 *       Handbook of Industrial Mixing, ch. 9, from memory); impeller 0.1 &lt;= D/T &lt;= 0.7; tip speed
 *       pi N D at most 25 m/s (industrial impellers run at about 1-10 m/s; common practice).</li>
 *   <li>Channel: the shear velocity lies below the mean velocity (U / u* is about 10-30 in rivers and flumes,
 *       from the log law; Chow 1959, Open-Channel Hydraulics, from memory); mean velocity at most 10 m/s; depth
 *       at least 0.01 m (shallower films are laminar or dominated by surface tension; common practice).</li>
 * </ul>
 */
public final class Plausibility {

    static final double MAX_TIP_SPEED = 25;
    static final double MAX_CHANNEL_VELOCITY = 10;
    static final double MIN_CHANNEL_DEPTH = 0.01;

    private Plausibility() {
    }

    /** The warnings for a scenario's design; empty when it lies where the rules hold. */
    public static List<String> warnings(Scenario s) {
        List<String> w = new ArrayList<>();
        if (s.flow() instanceof TankFlow t) {
            tank(t.design(), w);
        } else if (s.flow() instanceof ChannelFlow c) {
            channel(c.design(), w);
        }
        return List.copyOf(w);
    }

    private static void tank(TankDesign t, List<String> w) {
        double h = t.liquidHeight();
        double d = t.impellerDiameter();
        double ht = h / t.tankDiameter();
        double dt = d / t.tankDiameter();
        if (h <= d) {
            w.add(f("implausible design: flow.liquidHeight %s m is not above flow.impellerDiameter %s m, so the "
                    + "impeller would not be covered; the tank rules assume a liquid height about the tank diameter",
                    h, d));
        } else if (ht < 0.5 || ht > 2) {
            w.add(f("outside the rules' range: liquid height over tank diameter H/T = %s; the tank rules and the "
                    + "blend-time correlation hold for H/T from 0.5 to 2 (they assume H = T)", ht));
        }
        if (dt < 0.1 || dt > 0.7) {
            w.add(f("outside the rules' range: impeller over tank diameter D/T = %s; the tank rules hold for D/T from "
                    + "0.1 to 0.7", dt));
        }
        double tip = Math.PI * t.impellerSpeed() * d;
        if (tip > MAX_TIP_SPEED) {
            w.add(f("implausible design: impeller tip speed pi N D = %s m/s (flow.impellerSpeed %s rev/s, "
                    + "flow.impellerDiameter %s m); industrial impellers run at about 1 to 10 m/s and rarely above "
                    + "%s", tip, t.impellerSpeed(), d, MAX_TIP_SPEED));
        }
    }

    private static void channel(ChannelDesign c, List<String> w) {
        double shear = ChannelRules.shearVelocity(c).value();
        double u = c.meanVelocity();
        if (shear >= u) {
            w.add(f("implausible design: the shear velocity u* = %s m/s is not below flow.meanVelocity %s m/s; in "
                    + "open channels U / u* is about 10 to 30: check flow.meanVelocity and the field that sets u* "
                    + "(bedSlope, shearVelocity or manningN)", shear, u));
        }
        if (u > MAX_CHANNEL_VELOCITY) {
            w.add(f("outside the rules' range: flow.meanVelocity %s m/s; the channel rules were made for rivers, "
                    + "canals and flumes, below about %s m/s", u, MAX_CHANNEL_VELOCITY));
        }
        if (c.depth() < MIN_CHANNEL_DEPTH) {
            w.add(f("outside the rules' range: flow.depth %s m; the channel rules hold for turbulent flows at least"
                    + " %s m deep", c.depth(), MIN_CHANNEL_DEPTH));
        }
    }

    /** Formats the numbers with four significant digits. */
    private static String f(String template, double... values) {
        Object[] shown = new Object[values.length];
        for (int i = 0; i < values.length; i++) {
            shown[i] = String.format(Locale.ROOT, "%.4g", values[i]).replaceAll("(\\.\\d*?)0+$", "$1")
                    .replaceAll("\\.$", "");
        }
        return String.format(Locale.ROOT, template, shown);
    }
}
