package org.eddycast.engine;

import java.util.Locale;
import org.eddycast.scenario.ScenarioException;
import org.eddycast.scenario.SimulationSettings;

/**
 * The number of time steps of a run, computed in floating point before any conversion to an integer (a
 * duration of 4.3e7 s at a small step is 4e12 steps, which an int silently wraps), checked against
 * {@link SimulationSettings#MIN_STEPS} and {@link SimulationSettings#MAX_STEPS} whoever chose the time step
 * and the duration, with a message that says who chose what and which field to give or change.
 */
final class RunSize {

    private RunSize() {
    }

    /**
     * @param duration       duration (units of {@code timeUnit})
     * @param dt             time step (same units)
     * @param timeUnit       seconds per unit, for messages
     * @param durationChosen true when the engine chose the duration
     * @param stepChosen     true when the engine chose the time step
     * @return the number of steps, between the limits
     * @throws ScenarioException when the run would be too short or too long
     */
    static int steps(double duration, double dt, double timeUnit, boolean durationChosen, boolean stepChosen) {
        double exact = duration / dt;
        if (exact >= SimulationSettings.MIN_STEPS - 0.5 && exact <= SimulationSettings.MAX_STEPS + 0.5) {
            return (int) Math.round(exact);
        }
        boolean tooMany = !(exact < SimulationSettings.MIN_STEPS);
        String durationText = String.format(Locale.ROOT, "%s %s s", durationChosen
                ? "the duration the engine chose (40 times the larger of L/u' and tau),"
                : "simulation.duration", format(duration * timeUnit));
        String stepText = String.format(Locale.ROOT, "%s %s s", stepChosen
                ? "the time step the engine chose (a tenth of the field's shortest time scale),"
                : "simulation.timeStep", format(dt * timeUnit));
        String limit = tooMany ? String.format(Locale.ROOT, "at most %.0e", (double) SimulationSettings.MAX_STEPS)
                : "at least " + SimulationSettings.MIN_STEPS;
        double boundary = tooMany ? SimulationSettings.MAX_STEPS : SimulationSettings.MIN_STEPS;
        String advice;
        if (tooMany) {
            advice = String.format(Locale.ROOT, "give simulation.duration of at most %s s%s", format(boundary * dt * timeUnit),
                    stepChosen ? "" : ", or a larger simulation.timeStep");
        } else {
            advice = String.format(Locale.ROOT, "give simulation.duration of at least %s s%s", format(boundary * dt * timeUnit),
                    stepChosen ? "" : ", or a smaller simulation.timeStep");
        }
        throw new ScenarioException(String.format(Locale.ROOT, "simulation.duration: %s with %s gives %s steps; %s "
                + "are allowed: %s", durationText, stepText, format(exact), limit, advice));
    }

    /** Four significant digits without trailing zeros. */
    private static String format(double x) {
        String s = String.format(Locale.ROOT, "%.4g", x);
        int e = s.indexOf('e');
        String mantissa = e < 0 ? s : s.substring(0, e);
        if (mantissa.contains(".")) {
            mantissa = mantissa.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return mantissa + (e < 0 ? "" : s.substring(e));
    }
}
