package org.eddycast.measure;

import java.util.ArrayList;
import java.util.List;

/** Test records built from synthetic signals. */
final class Records {

    private Records() {
    }

    /** A record from components of equal length sampled at {@code fs}; sample i sits on line i + 2. */
    static VelocityRecord of(double fs, double[]... components) {
        int n = components[0].length;
        double[] t = new double[n];
        int[] lines = new int[n];
        for (int i = 0; i < n; i++) {
            t[i] = i / fs;
            lines[i] = i + 2;
        }
        List<String> names = new ArrayList<>();
        for (int c = 0; c < components.length; c++) {
            names.add("uvw".charAt(c) + " [m/s]");
        }
        return new VelocityRecord("synthetic", t, components, names, lines, fs, true, List.of(), List.of());
    }

    /** Adds a constant to every sample. */
    static double[] plus(double[] x, double mean) {
        double[] y = x.clone();
        for (int i = 0; i < y.length; i++) {
            y[i] += mean;
        }
        return y;
    }
}
