package org.eddycast.forecast;

/**
 * The ways a forecast states the width of a Gaussian tracer cloud or plume whose standard deviation is sigma.
 *
 * <p>For a Gaussian profile C(x) = C_peak exp(-x^2 / (2 sigma^2)), the full width between the two points
 * where C falls to a fraction f of the peak is 2 sigma sqrt(2 ln(1/f)) (exact). At f = 1/2 this is the full
 * width at half maximum, 2 sqrt(2 ln 2) sigma = 2.3548 sigma.
 *
 * <p>The visible-edge width uses {@link #DEFAULT_EDGE_FRACTION} = 0.1: the edge of a cloud as a person sees
 * it is taken to be where the concentration has fallen to a tenth of the peak, giving 4.292 sigma. The
 * fraction is this project's choice, not a published standard; how faint a tracer can still be seen depends on
 * the tracer, its dose, the light and the water. {@link #fullWidthAtFraction(double, double)} gives the width
 * for any other fraction.
 *
 * <p>Special cases: sigma = 0 gives a width of 0; the widths hold for a Gaussian profile only (far from
 * walls, before a cloud fills its container).
 */
public enum WidthMeasure {

    /** sigma itself. */
    STANDARD_DEVIATION("standard deviation", "sigma"),

    /** Full width at half of the peak concentration, 2 sqrt(2 ln 2) sigma. */
    FULL_WIDTH_AT_HALF_MAXIMUM("full width at half maximum", "2 sqrt(2 ln 2) sigma = 2.3548 sigma"),

    /** Full width where the concentration falls to {@link #DEFAULT_EDGE_FRACTION} of the peak. */
    VISIBLE_EDGE("visible-edge width (where concentration falls to 10% of the peak)",
            "2 sigma sqrt(2 ln(1/0.1)) = 4.2919 sigma");

    /** The fraction of the peak concentration that marks the visible edge: 0.1 (this project's choice). */
    public static final double DEFAULT_EDGE_FRACTION = 0.1;

    private final String label;
    private final String formula;

    WidthMeasure(String label, String formula) {
        this.label = label;
        this.formula = formula;
    }

    /** A name for outputs, for example "full width at half maximum". */
    public String label() {
        return label;
    }

    /** The rule in words, for outputs. */
    public String formula() {
        return formula;
    }

    /** Width over sigma for this measure. */
    public double factorOfSigma() {
        return switch (this) {
            case STANDARD_DEVIATION -> 1.0;
            case FULL_WIDTH_AT_HALF_MAXIMUM -> fullWidthAtFraction(1.0, 0.5);
            case VISIBLE_EDGE -> fullWidthAtFraction(1.0, DEFAULT_EDGE_FRACTION);
        };
    }

    /** The width of a Gaussian profile with standard deviation {@code sigma} (same unit as sigma). */
    public double width(double sigma) {
        Checks.nonNegative("sigma", sigma, "");
        return factorOfSigma() * sigma;
    }

    /**
     * Full width of a Gaussian profile between the points where the concentration is {@code fraction} of the
     * peak: 2 sigma sqrt(2 ln(1/fraction)).
     *
     * @param sigma    standard deviation, at least 0
     * @param fraction fraction of the peak, strictly between 0 and 1
     */
    public static double fullWidthAtFraction(double sigma, double fraction) {
        Checks.nonNegative("sigma", sigma, "");
        Checks.openFraction("fraction", fraction);
        return 2.0 * sigma * Math.sqrt(2.0 * Math.log(1.0 / fraction));
    }
}
