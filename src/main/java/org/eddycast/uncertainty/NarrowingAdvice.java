package org.eddycast.uncertainty;

import java.util.List;
import java.util.Locale;
import java.util.function.DoubleFunction;

/**
 * The one-line advice: which input to measure better, and how much that would narrow the answer's range.
 *
 * <p>The input named is the one with the largest total index S_T. Halving its spread is estimated under a
 * linear approximation of the response: the input's contribution to the variance, S_T V, scales with the
 * square of its spread and so drops to a quarter, leaving V (1 - S_T + S_T / 4) = V (1 - 0.75 S_T). The 5-95%
 * width then scales by sqrt(1 - 0.75 S_T), about the range's midpoint. Strong curvature or interactions make
 * this a rough guide only; the sentence says "about". S_T is clipped to [0, 1] for the estimate.
 */
public final class NarrowingAdvice {

    private NarrowingAdvice() {
    }

    /**
     * The advice sentence.
     *
     * @param inputs the inputs' names
     * @param total  their total indices, in the same order
     * @param p05    the response's 5th percentile
     * @param p95    the response's 95th percentile
     * @param format how to write a response value (with its unit, if wanted)
     */
    public static String sentence(List<String> inputs, double[] total, double p05, double p95,
                                  DoubleFunction<String> format) {
        if (inputs.size() != total.length) {
            throw new IllegalArgumentException(
                    inputs.size() + " input names were given for " + total.length + " total indices");
        }
        int top = mostSensitive(total);
        if (total[top] <= 0) {
            return "No input moves the answer measurably across its range, so measuring one better would not"
                    + " narrow the 5-95% range.";
        }
        double share = Math.min(1, total[top]);
        double factor = narrowingFactor(share);
        double middle = 0.5 * (p05 + p95);
        double halfWidth = 0.5 * (p95 - p05) * factor;
        return "The answer is most sensitive to " + inputs.get(top) + " (total index "
                + String.format(Locale.ROOT, "%.2f", total[top]) + "); measuring it to half its present spread"
                + " would narrow the 5-95% range from " + format.apply(p05) + " to " + format.apply(p95)
                + " to about " + format.apply(middle - halfWidth) + " to " + format.apply(middle + halfWidth) + ".";
    }

    /** sqrt(1 - 0.75 S_T): how the 5-95% width scales when the input's spread is halved. */
    static double narrowingFactor(double totalIndex) {
        double s = Math.max(0, Math.min(1, totalIndex));
        return Math.sqrt(1 - 0.75 * s);
    }

    /**
     * The index of the largest total index (the first of equals).
     *
     * @throws IllegalArgumentException for no indices or an index that is not a number
     */
    public static int mostSensitive(double[] total) {
        if (total.length == 0) {
            throw new IllegalArgumentException("no total indices were given");
        }
        int top = 0;
        for (int i = 0; i < total.length; i++) {
            if (Double.isNaN(total[i])) {
                throw new IllegalArgumentException("total index " + i + " is not a number");
            }
            if (total[i] > total[top]) {
                top = i;
            }
        }
        return top;
    }
}
