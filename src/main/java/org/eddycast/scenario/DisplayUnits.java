package org.eddycast.scenario;

import java.util.List;

/**
 * The units the text outputs and the headline use; the JSON stays in SI units with the display unit named beside
 * each figure.
 *
 * @param concentration "kg/m3", "mg/L" or "ug/L"
 * @param time          "s", "min" or "h"
 * @param distance      "m" or "km"
 * @param speed         impeller speed: "rev/s" or "rpm"
 */
public record DisplayUnits(String concentration, String time, String distance, String speed) {

    public static final List<String> CONCENTRATIONS = List.of("kg/m3", "mg/L", "ug/L");
    public static final List<String> TIMES = List.of("s", "min", "h");
    public static final List<String> DISTANCES = List.of("m", "km");
    public static final List<String> SPEEDS = List.of("rev/s", "rpm");

    public DisplayUnits {
        if (!CONCENTRATIONS.contains(concentration) || !TIMES.contains(time) || !DISTANCES.contains(distance)
                || !SPEEDS.contains(speed)) {
            throw new IllegalArgumentException("units must be one of " + CONCENTRATIONS + ", " + TIMES + ", "
                    + DISTANCES + ", " + SPEEDS + "; got " + concentration + ", " + time + ", " + distance + ", "
                    + speed);
        }
    }

    /** Impeller speeds in rev/s. */
    public DisplayUnits(String concentration, String time, String distance) {
        this(concentration, time, distance, "rev/s");
    }

    /** SI units throughout. */
    public static DisplayUnits si() {
        return new DisplayUnits("kg/m3", "s", "m", "rev/s");
    }

    /** An impeller speed in rev/s in the display unit (1 rev/s = 60 rpm). */
    public double speed(double revolutionsPerSecond) {
        return speed.equals("rpm") ? 60 * revolutionsPerSecond : revolutionsPerSecond;
    }

    /** A concentration in kg/m^3 in the display unit (1 kg/m^3 = 1,000 mg/L = 1,000,000 ug/L). */
    public double concentration(double kgPerCubicMetre) {
        return kgPerCubicMetre * switch (concentration) {
            case "mg/L" -> 1e3;
            case "ug/L" -> 1e6;
            default -> 1;
        };
    }

    /** A time in s in the display unit. */
    public double time(double seconds) {
        return seconds / switch (time) {
            case "min" -> 60;
            case "h" -> 3600;
            default -> 1;
        };
    }

    /** A distance in m in the display unit. */
    public double distance(double metres) {
        return distance.equals("km") ? metres / 1000 : metres;
    }
}
