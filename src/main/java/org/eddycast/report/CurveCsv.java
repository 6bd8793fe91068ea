package org.eddycast.report;

import java.util.Locale;
import org.eddycast.engine.DiffusivityResult;
import org.eddycast.engine.StudyResult;
import org.eddycast.forecast.Cautions;
import org.eddycast.scenario.DisplayUnits;

/**
 * The mean-square-displacement curves of a result as CSV: time, then value and standard error per axis.
 * A file starts with a comment line {@code # eddycast <version>, seed <seed>} so the numbers can be traced
 * to the build and the random stream that made them, then the cautions as comment lines ({@code # ...}): a file
 * that travels alone still carries them.
 */
public final class CurveCsv {

    private CurveCsv() {
    }

    /** The curves of a study as a CSV file: the version-and-seed comment line, then the table. */
    public static String text(StudyResult s) {
        return header(s.toolVersion(), s.scenario().simulation().seed())
                + text(s.diffusivity(), s.scenario().forecast().units());
    }

    /** The comment lines that open every curve file: version and seed, then the cautions. */
    public static String header(String toolVersion, long seed) {
        StringBuilder sb = new StringBuilder(String.format(Locale.ROOT, "# eddycast %s, seed %d\n", toolVersion, seed));
        for (String line : Cautions.lines("# ")) {
            sb.append(line).append('\n');
        }
        return sb.toString();
    }

    /**
     * The table alone (column names, then one row per record time), without the opening comment line: for a
     * file, use {@link #text(StudyResult)}, which carries the version and the seed.
     */
    public static String text(DiffusivityResult r) {
        return text(r, DisplayUnits.si());
    }

    /**
     * The table in the scenario's display units of time and distance: the column names end with the unit
     * ({@code time_min}, {@code msd_x_km2}), and the values are converted.
     */
    public static String text(DiffusivityResult r, DisplayUnits u) {
        String[] names = {"x", "y", "z"};
        int axes = r.axes().size();
        String area = u.distance() + "2";
        double perSquareMetre = u.distance(1) * u.distance(1);
        StringBuilder sb = new StringBuilder("time_" + u.time());
        for (int a = 0; a < axes; a++) {
            sb.append(",msd_").append(names[a]).append('_').append(area).append(",msd_").append(names[a])
                    .append("_stderr_").append(area);
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
            sb.append(String.format(Locale.ROOT, "%.9g", u.time(t[j])));
            for (int a = 0; a < axes; a++) {
                sb.append(String.format(Locale.ROOT, ",%.9g,%.9g", v[a][j] * perSquareMetre,
                        e[a][j] * perSquareMetre));
            }
            sb.append('\n');
        }
        return sb.toString();
    }
}
