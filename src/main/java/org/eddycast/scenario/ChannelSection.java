package org.eddycast.scenario;

import java.util.Arrays;

/**
 * The shape of a channel's cross-section: y across from the left water's edge (0 to the surface width W),
 * local depth h(y). Plain data with its geometry; rectangular unless the user says otherwise.
 */
public sealed interface ChannelSection permits ChannelSection.Rectangular, ChannelSection.Trapezoidal,
        ChannelSection.Surveyed {

    /** Surface width W (m). */
    double width();

    /** Greatest depth (m). */
    double maxDepth();

    /** Local depth h(y) (m), 0 outside [0, W]. */
    double depthAt(double y);

    /** Flow area A (m^2). */
    double area();

    /** Wetted perimeter P (m): bed and banks. */
    double wettedPerimeter();

    /** The word the scenario file uses. */
    String kind();

    /** Hydraulic radius A / P (m). */
    default double hydraulicRadius() {
        return area() / wettedPerimeter();
    }

    /** Mean depth A / W (m). */
    default double meanDepth() {
        return area() / width();
    }

    /**
     * A rectangle W wide and h deep.
     *
     * @param width W (m), greater than 0
     * @param depth h (m), greater than 0
     */
    record Rectangular(double width, double depth) implements ChannelSection {
        public Rectangular {
            DesignChecks.positive("flow.width", width, "m");
            DesignChecks.positive("flow.depth", depth, "m");
        }

        @Override
        public double maxDepth() {
            return depth;
        }

        @Override
        public double depthAt(double y) {
            return y < 0 || y > width ? 0 : depth;
        }

        @Override
        public double area() {
            return width * depth;
        }

        @Override
        public double wettedPerimeter() {
            return width + 2 * depth;
        }

        @Override
        public String kind() {
            return "rectangular";
        }
    }

    /**
     * A trapezoid: a flat bed and two banks of equal slope, W wide at the surface.
     *
     * @param width     W, the surface width (m), greater than 2 m h
     * @param depth     h, the depth over the flat bed (m), greater than 0
     * @param sideSlope m, horizontal run per unit rise of each bank, greater than 0
     */
    record Trapezoidal(double width, double depth, double sideSlope) implements ChannelSection {
        public Trapezoidal {
            DesignChecks.positive("flow.width", width, "m");
            DesignChecks.positive("flow.depth", depth, "m");
            DesignChecks.positive("flow.section.sideSlope", sideSlope, "(horizontal per vertical)");
            if (!(width > 2 * sideSlope * depth)) {
                throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                        "flow.section.sideSlope: banks of slope %.3g over a depth of %.3g m need a surface width"
                                + " above %.3g m; got flow.width %.3g m", sideSlope, depth,
                        2 * sideSlope * depth, width));
            }
        }

        /** Width of the flat bed (m). */
        public double bedWidth() {
            return width - 2 * sideSlope * depth;
        }

        @Override
        public double maxDepth() {
            return depth;
        }

        @Override
        public double depthAt(double y) {
            if (y < 0 || y > width) {
                return 0;
            }
            return Math.min(depth, Math.min(y, width - y) / sideSlope);
        }

        @Override
        public double area() {
            return (bedWidth() + sideSlope * depth) * depth;
        }

        @Override
        public double wettedPerimeter() {
            return bedWidth() + 2 * depth * Math.sqrt(1 + sideSlope * sideSlope);
        }

        @Override
        public String kind() {
            return "trapezoidal";
        }
    }

    /**
     * A surveyed section, as a discharge gauging gives it: verticals at distances from the left water's edge,
     * each with its depth and depth-averaged velocity; linear between verticals.
     *
     * @param offsets    distances from the left water's edge (m), increasing, the first 0
     * @param depths     depth at each vertical (m), at least 0, some greater than 0
     * @param velocities depth-averaged velocity at each vertical (m/s), at least 0
     */
    record Surveyed(double[] offsets, double[] depths, double[] velocities) implements ChannelSection {
        public Surveyed {
            offsets = offsets.clone();
            depths = depths.clone();
            velocities = velocities.clone();
            if (offsets.length < 3 || depths.length != offsets.length || velocities.length != offsets.length) {
                throw new IllegalArgumentException("flow.section.verticals: give at least 3 verticals, each with"
                        + " offset (m), depth (m) and velocity (m/s); got " + offsets.length);
            }
            for (int i = 0; i < offsets.length; i++) {
                String at = "flow.section.verticals[" + i + "]";
                if (!(offsets[i] >= 0) || !Double.isFinite(offsets[i]) || (i > 0 && !(offsets[i] > offsets[i - 1]))) {
                    throw new IllegalArgumentException(at + ".offset: offsets must start at 0 or more and increase;"
                            + " got " + offsets[i]);
                }
                if (!(depths[i] >= 0) || !Double.isFinite(depths[i])) {
                    throw new IllegalArgumentException(at + ".depth: must be 0 or more (m); got " + depths[i]);
                }
                if (!(velocities[i] >= 0) || !Double.isFinite(velocities[i])) {
                    throw new IllegalArgumentException(at + ".velocity: must be 0 or more (m/s); got "
                            + velocities[i]);
                }
            }
            if (Arrays.stream(depths).max().orElse(0) <= 0) {
                throw new IllegalArgumentException("flow.section.verticals: at least one depth must be above 0");
            }
        }

        @Override
        public double[] offsets() {
            return offsets.clone();
        }

        @Override
        public double[] depths() {
            return depths.clone();
        }

        @Override
        public double[] velocities() {
            return velocities.clone();
        }

        @Override
        public double width() {
            return offsets[offsets.length - 1] - offsets[0];
        }

        @Override
        public double maxDepth() {
            return Arrays.stream(depths).max().orElse(0);
        }

        @Override
        public double depthAt(double y) {
            return interpolate(depths, y);
        }

        /** Depth-averaged velocity at y (m/s), linear between verticals. */
        public double velocityAt(double y) {
            return interpolate(velocities, y);
        }

        private double interpolate(double[] values, double y) {
            double at = y + offsets[0];
            if (at < offsets[0] || at > offsets[offsets.length - 1]) {
                return 0;
            }
            int i = 1;
            while (i < offsets.length - 1 && offsets[i] < at) {
                i++;
            }
            double f = (at - offsets[i - 1]) / (offsets[i] - offsets[i - 1]);
            return values[i - 1] + f * (values[i] - values[i - 1]);
        }

        @Override
        public double area() {
            double a = 0;
            for (int i = 1; i < offsets.length; i++) {
                a += 0.5 * (depths[i] + depths[i - 1]) * (offsets[i] - offsets[i - 1]);
            }
            return a;
        }

        /** Discharge by the mid-section sum of depth x velocity, trapezoidal between verticals (m^3/s). */
        public double discharge() {
            double q = 0;
            for (int i = 1; i < offsets.length; i++) {
                double dy = offsets[i] - offsets[i - 1];
                // exact integral of the product of two linear functions over the panel
                q += dy * (2 * depths[i - 1] * velocities[i - 1] + 2 * depths[i] * velocities[i]
                        + depths[i - 1] * velocities[i] + depths[i] * velocities[i - 1]) / 6;
            }
            return q;
        }

        @Override
        public double wettedPerimeter() {
            double p = depths[0] + depths[depths.length - 1];
            for (int i = 1; i < offsets.length; i++) {
                p += Math.hypot(offsets[i] - offsets[i - 1], depths[i] - depths[i - 1]);
            }
            return p;
        }

        @Override
        public String kind() {
            return "surveyed";
        }
    }
}
