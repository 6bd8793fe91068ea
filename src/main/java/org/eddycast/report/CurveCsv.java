package org.eddycast.report;

import java.util.Locale;
import org.eddycast.engine.DiffusivityResult;

/** The mean-square-displacement curves of a result as CSV: time, then value and standard error per axis. */
public final class CurveCsv {

    private CurveCsv() {
    }

    public static String text(DiffusivityResult r) {
        String[] names = {"x", "y", "z"};
        int axes = r.axes().size();
        StringBuilder sb = new StringBuilder("time_s");
        for (int a = 0; a < axes; a++) {
            sb.append(",msd_").append(names[a]).append("_m2,msd_").append(names[a]).append("_stderr_m2");
        }
        sb.append('\n');
        double[] t = r.times();
        double[][] v = new double[axes][];
        double[][] e = new double[axes][];
        for (int a = 0; a < axes; a++) {
            v[a] = r.meanSquareDisplacement(a);
            e[a] = r.meanSquareDisplacementError(a);
        }
        for (int j = 0; j < t.length; j++) {
            sb.append(String.format(Locale.ROOT, "%.9g", t[j]));
            for (int a = 0; a < axes; a++) {
                sb.append(String.format(Locale.ROOT, ",%.9g,%.9g", v[a][j], e[a][j]));
            }
            sb.append('\n');
        }
        return sb.toString();
    }
}
