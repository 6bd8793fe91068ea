package org.eddycast.scenario;

/**
 * A first-order loss of the released substance (photodegradation of a dye, chlorine demand): every concentration
 * falls as dc/dt = -k c on top of the spreading, so a concentration at time t after the release is multiplied
 * by exp(-k t). The user gives either the rate k or the half-life ln 2 / k; a half-life is kept as given so a
 * saved file says it as the user did.
 *
 * @param rate          k (1/s); 0 for none
 * @param halfLifeGiven the half-life as the scenario gave it (s), NaN when the rate was given (or none)
 */
public record FirstOrderLoss(double rate, double halfLifeGiven) {

    /** No loss: a conservative tracer. */
    public static final FirstOrderLoss NONE = new FirstOrderLoss(0, Double.NaN);

    /** The loss at rate {@code k} (1/s). */
    public static FirstOrderLoss ofRate(double k) {
        return new FirstOrderLoss(k, Double.NaN);
    }

    /** The loss with half-life {@code halfLife} (s). */
    public static FirstOrderLoss ofHalfLife(double halfLife) {
        return new FirstOrderLoss(Math.log(2) / halfLife, halfLife);
    }

    /** True when there is a loss. */
    public boolean present() {
        return rate > 0;
    }

    /** True when the scenario gave the half-life rather than the rate. */
    public boolean givenAsHalfLife() {
        return !Double.isNaN(halfLifeGiven);
    }

    /** The half-life ln 2 / k (s); infinite without a loss. */
    public double halfLife() {
        return givenAsHalfLife() ? halfLifeGiven : Math.log(2) / rate;
    }

    /** The fraction left at time t after the release: exp(-k t), the solution of dc/dt = -k c. */
    public double remaining(double t) {
        return Math.exp(-rate * t);
    }
}
