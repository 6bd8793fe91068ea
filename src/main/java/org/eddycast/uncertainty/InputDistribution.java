package org.eddycast.uncertainty;

/**
 * One uncertain input's distribution, given by its inverse cumulative distribution function so that a point of
 * the unit cube (a row of a {@link SaltelliDesign}) maps to input values by one quantile per input.
 *
 * <p>Implementations are records whose constructors refuse invalid parameters with an
 * {@link IllegalArgumentException} that names the parameter and the valid range.
 */
public sealed interface InputDistribution permits UniformRange, TriangularRange, NormalRange, LogNormalRange {

    /**
     * The inverse cumulative distribution function.
     *
     * @param u a probability strictly between 0 and 1
     * @return the value below which the input lies with probability u
     * @throws IllegalArgumentException when u is not strictly between 0 and 1
     */
    double quantile(double u);

    /** The distribution's analytic mean. */
    double mean();

    /** A short description in words, e.g. "uniform 0.4 to 0.5". */
    String describe();

    /** Refuses a probability outside the open interval (0, 1), where some quantiles are infinite. */
    static void checkProbability(double u) {
        if (!(u > 0 && u < 1)) {
            throw new IllegalArgumentException("a quantile needs a probability strictly between 0 and 1, not " + u);
        }
    }
}
