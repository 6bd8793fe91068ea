package org.eddycast.uncertainty;

import java.math.BigDecimal;
import java.math.MathContext;

/** Parameter checks and number wording shared by the input distributions. */
final class RangeText {

    private RangeText() {
    }

    /** Three significant figures, trailing zeros dropped, no exponent for everyday magnitudes. */
    static String number(double x) {
        if (x == 0) {
            return "0";
        }
        BigDecimal d = new BigDecimal(x).round(new MathContext(3)).stripTrailingZeros();
        double magnitude = Math.abs(x);
        return magnitude >= 1e-4 && magnitude < 1e7 ? d.toPlainString() : d.toString().replace('E', 'e');
    }

    static void requireFinite(String distribution, String name, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(distribution + ": " + name + " must be a finite number, not " + value);
        }
    }
}
