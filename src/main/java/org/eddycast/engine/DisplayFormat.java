package org.eddycast.engine;

import java.math.BigDecimal;
import java.math.MathContext;
import org.eddycast.scenario.DisplayUnits;

/** Figures in the scenario's display units, rounded to what a screening estimate can claim. */
public final class DisplayFormat {

    private final DisplayUnits units;

    public DisplayFormat(DisplayUnits units) {
        this.units = units;
    }

    /** A concentration (kg/m^3) with its unit, e.g. "3.4 ug/L". */
    public String concentration(double kgPerCubicMetre) {
        return round(units.concentration(kgPerCubicMetre)) + " " + units.concentration();
    }

    /** A time (s) with its unit, e.g. "7.5 min". */
    public String time(double seconds) {
        return round(units.time(seconds)) + " " + units.time();
    }

    /** A time (s) in the display unit, without the unit. */
    public double unitsTime(double seconds) {
        return units.time(seconds);
    }

    /**
     * A value given in an SI unit, in the display unit that unit maps to: kg/m^3 as a concentration, s as a
     * time, m as a distance; any other unit as it is.
     */
    public String ofUnit(String siUnit, double v) {
        if (!Double.isFinite(v)) {
            return "not determined";
        }
        return switch (siUnit) {
            case "kg/m^3" -> concentration(v);
            case "s" -> time(v);
            case "m" -> distance(v);
            default -> round(v) + " " + siUnit;
        };
    }

    /** A distance (m) with its unit, e.g. "200 m". */
    public String distance(double metres) {
        return round(units.distance(metres)) + " " + units.distance();
    }

    /**
     * Two significant figures, plain notation for values from 0.001 to a million (the screening estimate's
     * precision; the JSON keeps full precision), scientific notation beyond.
     */
    public static String round(double v) {
        if (!Double.isFinite(v)) {
            return "not determined";
        }
        if (v == 0) {
            return "0";
        }
        double a = Math.abs(v);
        if (a < 1e-3 || a >= 1e6) {
            return String.format(java.util.Locale.ROOT, "%.1e", v);
        }
        return new BigDecimal(v).round(new MathContext(2)).stripTrailingZeros().toPlainString();
    }
}
