package org.eddycast.forecast;

/**
 * The stated uncertainty of a handbook estimate: either a factor (the true value lies between value / f and
 * value * f) or a percentage (value (1 - p/100) to value (1 + p/100)), with the basis of the statement.
 *
 * @param kind   factor or percent
 * @param amount the factor (at least 1) or the percentage (0 to less than 100)
 * @param basis  where the figure comes from, for example "Fischer 1975 (from memory)" or "our allowance"
 */
public record Uncertainty(Kind kind, double amount, String basis) {

    /** How the uncertainty is expressed. */
    public enum Kind {
        FACTOR,
        PERCENT
    }

    public Uncertainty {
        if (kind == null) {
            throw new IllegalArgumentException("uncertainty kind must be FACTOR or PERCENT");
        }
        if (kind == Kind.FACTOR && !(amount >= 1 && Double.isFinite(amount))) {
            throw new IllegalArgumentException("uncertainty factor must be a finite number >= 1; got " + amount);
        }
        if (kind == Kind.PERCENT && !(amount >= 0 && amount < 100)) {
            throw new IllegalArgumentException("uncertainty percentage must lie in [0, 100); got " + amount);
        }
        basis = basis == null ? "" : basis;
    }

    /** Within a factor f. */
    public static Uncertainty factor(double factor, String basis) {
        return new Uncertainty(Kind.FACTOR, factor, basis);
    }

    /** Within plus or minus p percent. */
    public static Uncertainty percent(double percent, String basis) {
        return new Uncertainty(Kind.PERCENT, percent, basis);
    }

    /** The low end of the band around a positive value. */
    public double low(double value) {
        return kind == Kind.FACTOR ? value / amount : value * (1.0 - amount / 100.0);
    }

    /** The high end of the band around a positive value. */
    public double high(double value) {
        return kind == Kind.FACTOR ? value * amount : value * (1.0 + amount / 100.0);
    }

    /** In words, for example "within a factor of 4" or "+-50%". */
    public String describe() {
        String figure = kind == Kind.FACTOR ? "within a factor of " + trim(amount) : "+-" + trim(amount) + "%";
        return basis.isEmpty() ? figure : figure + " (" + basis + ")";
    }

    private static String trim(double x) {
        return x == Math.rint(x) ? String.valueOf((long) x) : String.valueOf(x);
    }
}
