package org.eddycast.report;

import java.util.List;

/**
 * What a chart shows, as plain data kept apart from any drawing code: the panel and the summary sheet draw the
 * same spec.
 *
 * @param title  the chart's title
 * @param xLabel the horizontal axis label, with its unit
 * @param yLabel the vertical axis label, with its unit
 * @param logX   logarithmic horizontal axis
 * @param logY   logarithmic vertical axis
 * @param curves the curves in drawing order
 */
public record ChartSpec(String title, String xLabel, String yLabel, boolean logX, boolean logY,
                        List<Curve> curves) {

    public ChartSpec {
        curves = List.copyOf(curves);
    }

    /** True when no curve has a point. */
    public boolean isEmpty() {
        return curves.stream().allMatch(c -> c.x().length == 0);
    }

    /**
     * One curve, with an optional band (both {@code low} and {@code high}, or neither).
     *
     * @param name   the legend entry
     * @param x      horizontal values
     * @param y      vertical values
     * @param low    lower edge of the band, or null
     * @param high   upper edge of the band, or null
     * @param dashed drawn dashed (reference lines, fits)
     * @param colour index into the drawing palette's series colours, or -1 for the curve's position; lets a
     *               reference curve share the colour of the curve it belongs to
     */
    public record Curve(String name, double[] x, double[] y, double[] low, double[] high, boolean dashed,
                        int colour) {

        /** A curve coloured by its position. */
        public Curve(String name, double[] x, double[] y, double[] low, double[] high, boolean dashed) {
            this(name, x, y, low, high, dashed, -1);
        }

        public Curve {
            if (x.length != y.length) {
                throw new IllegalArgumentException("curve " + name + ": " + x.length + " x values but " + y.length
                        + " y values");
            }
            if (colour < -1) {
                throw new IllegalArgumentException("curve " + name + ": colour index " + colour
                        + " must be -1 (by position) or a palette index from 0");
            }
            if ((low == null) != (high == null) || (low != null && (low.length != x.length
                    || high.length != x.length))) {
                throw new IllegalArgumentException("curve " + name + ": a band needs low and high of the curve's "
                        + "length");
            }
            x = x.clone();
            y = y.clone();
            low = low == null ? null : low.clone();
            high = high == null ? null : high.clone();
        }

        /** A line with no band. */
        public static Curve line(String name, double[] x, double[] y, boolean dashed) {
            return new Curve(name, x, y, null, null, dashed);
        }

        @Override
        public double[] x() {
            return x.clone();
        }

        @Override
        public double[] y() {
            return y.clone();
        }

        @Override
        public double[] low() {
            return low == null ? null : low.clone();
        }

        @Override
        public double[] high() {
            return high == null ? null : high.clone();
        }

        /** True when the curve has a band. */
        public boolean hasBand() {
            return low != null;
        }
    }
}
