package org.eddycast.engine;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.stats.DisplacementMoments;
import org.eddycast.stats.LateWindowSlopeEstimator;

/**
 * A measurement, not a test: does a covariance-weighted fit of the mean-square-displacement curve shorten the
 * time to a given interval width? For exact verification flows it runs many independent seeds and compares,
 * per estimator, the bias against the exact value (with its standard error over seeds), the spread of the
 * estimates between seeds (the true standard error) and the mean standard error each estimator reports.
 * The time to a given interval width grows with the estimator's variance, so the ratio of variances is the
 * ratio of run times.
 *
 * <p>Estimators: (a) the tool's ordinary least-squares slope over the late window [T/2, T]; (b) generalized
 * least squares over the same window with the blocks' sample covariance of the curve (Aitken 1935, "On least
 * squares and linear combination of observations", Proc. R. Soc. Edinburgh 55:42), a small ridge added for
 * a covariance estimated from few blocks; (c) the same over [T/4, T], a longer stretch of the curve.
 *
 * <p>Run: {@code mvn -B -q test-compile exec:exec -Dexec.executable=java -Dexec.classpathScope=test
 * -Dexec.args="--add-modules jdk.incubator.vector -cp %classpath org.eddycast.engine.BenchmarkEstimatorVariance
 * SEEDS PARTICLES"}.
 */
public final class BenchmarkEstimatorVariance {

    /** One estimator's value and reported standard error on one run. */
    record Estimate(double value, double standardError) {
    }

    private BenchmarkEstimatorVariance() {
    }

    public static void main(String[] args) {
        int seeds = args.length > 0 ? Integer.parseInt(args[0]) : 30;
        int particles = args.length > 1 ? Integer.parseInt(args[1]) : 8192;
        for (VerificationCase c : VerificationSuite.cases()) {
            if (c.name().endsWith("D_yy")) {
                continue; // the cellular flow's second axis repeats its first
            }
            measure(c, seeds, particles);
        }
        windowBiasOnTaylorsCurve();
    }

    /**
     * The finite-time bias of each fixed-weight estimator, from the exact mean curve of a uniform
     * Ornstein-Uhlenbeck velocity (Taylor 1921: sigma^2 = 2 u'^2 T_L [t - T_L (1 - e^{-t/T_L})], u' = T_L = 1)
     * sampled at the tool's record times, for runs of 10, 20 and 40 T_L: what an earlier window costs.
     */
    static void windowBiasOnTaylorsCurve() {
        System.out.println("relative bias of the fixed weights on Taylor's exact curve (u' = T_L = 1, dt = 0.05):");
        for (double duration : new double[] {10, 20, 40}) {
            int steps = (int) Math.round(duration / 0.05);
            double[] times = org.eddycast.particles.RecordSchedule.forSteps(steps).times(0.05);
            double[] curve = new double[times.length];
            for (int j = 0; j < times.length; j++) {
                curve[j] = 2 * (times[j] - (1 - Math.exp(-times[j])));
            }
            double end = times[times.length - 1];
            System.out.printf(Locale.ROOT, "  T = %2.0f T_L: OLS [T/2, T] %+.2e, model [T/2, T] %+.2e, "
                            + "model [T/4, T] %+.2e%n", duration,
                    0.5 * dot(weights(times, end / 2, end, false), curve) - 1,
                    0.5 * dot(weights(times, end / 2, end, true), curve) - 1,
                    0.5 * dot(weights(times, end / 4, end, true), curve) - 1);
        }
    }

    private static double dot(double[] w, double[] y) {
        double s = 0;
        for (int j = 0; j < w.length; j++) {
            s += w[j] * y[j];
        }
        return s;
    }

    /** Slope weights over all records (zero outside [start, end]): ordinary, or with the model covariance. */
    static double[] weights(double[] times, double start, double end, boolean model) {
        double[][] weighting = new double[times.length][times.length];
        for (int a = 0; a < times.length; a++) {
            for (int b = 0; b < times.length; b++) {
                double t = Math.min(times[a], times[b]);
                weighting[a][b] = model ? t * t : (a == b ? 1 : 0);
            }
        }
        return weights(times, start, end, weighting);
    }

    /**
     * Generalized least-squares slope weights w = e2' (X' C^-1 X)^-1 X' C^-1 for c + s t over the records in
     * [start, end], C the weighting restricted to them plus a ridge of 1e-6 of its mean diagonal; zero outside.
     */
    static double[] weights(double[] times, double start, double end, double[][] weighting) {
        List<Integer> in = new ArrayList<>();
        for (int j = 0; j < times.length; j++) {
            if (times[j] >= start - 1e-12 * end && times[j] <= end + 1e-12 * end) {
                in.add(j);
            }
        }
        int r = in.size();
        RealMatrix c = new Array2DRowRealMatrix(r, r);
        RealMatrix x = new Array2DRowRealMatrix(r, 2);
        double trace = 0;
        for (int a = 0; a < r; a++) {
            for (int b = 0; b < r; b++) {
                c.setEntry(a, b, weighting[in.get(a)][in.get(b)]);
            }
            trace += c.getEntry(a, a);
            x.setEntry(a, 0, 1);
            x.setEntry(a, 1, times[in.get(a)]);
        }
        for (int a = 0; a < r; a++) {
            c.addToEntry(a, a, 1e-6 * trace / r);
        }
        RealMatrix cInvX = new LUDecomposition(c).getSolver().solve(x);
        RealMatrix normalInverse = new LUDecomposition(x.transpose().multiply(cInvX)).getSolver().getInverse();
        RealVector w = cInvX.multiply(normalInverse).getColumnVector(1);
        double[] all = new double[times.length];
        for (int a = 0; a < r; a++) {
            all[in.get(a)] = w.getEntry(a);
        }
        return all;
    }

    static void measure(VerificationCase c, int seeds, int particles) {
        String[] names = {"OLS [T/2, T]", "GLS [T/2, T]", "GLS [T/4, T]", "model [T/2, T]", "model [T/4, T]"};
        List<double[]> values = new ArrayList<>();
        List<double[]> errors = new ArrayList<>();
        for (int s = 0; s < seeds; s++) {
            VerificationCase small = new VerificationCase(c.name(), c.source(), c.model(), c.axis(), c.expected(),
                    c.biasBound(), c.biasReason(), c.d0(), c.integrator(), c.timeStep(), c.steps(), c.groupSize(),
                    particles);
            DiffusivityResult r = DiffusivityStudy.run(small.toCase(1000 + s), 2, RunListener.NONE,
                    new Cancellation());
            DisplacementMoments m = r.moments();
            double end = m.time(m.records() - 1);
            Estimate[] e = {ordinary(m, c.axis(), end / 2, end), generalized(m, c.axis(), end / 2, end, false),
                generalized(m, c.axis(), end / 4, end, false), generalized(m, c.axis(), end / 2, end, true),
                generalized(m, c.axis(), end / 4, end, true)};
            double[] v = new double[e.length];
            double[] se = new double[e.length];
            for (int k = 0; k < e.length; k++) {
                v[k] = e[k].value();
                se[k] = e[k].standardError();
            }
            values.add(v);
            errors.add(se);
        }
        System.out.printf(Locale.ROOT, "%s: exact %.5f (bias bound %.2g), %d seeds of %d particles%n", c.name(),
                c.expected(), c.biasBound(), seeds, particles);
        double olsVariance = Double.NaN;
        for (int k = 0; k < names.length; k++) {
            double mean = 0;
            double meanSe = 0;
            for (int s = 0; s < seeds; s++) {
                mean += values.get(s)[k] / seeds;
                meanSe += errors.get(s)[k] / seeds;
            }
            double var = 0;
            for (int s = 0; s < seeds; s++) {
                double d = values.get(s)[k] - mean;
                var += d * d / (seeds - 1);
            }
            if (k == 0) {
                olsVariance = var;
            }
            System.out.printf(Locale.ROOT, "  %-13s mean %.5f, bias %+.5f +- %.5f (%+.2f standard errors), "
                            + "spread between seeds %.5f, mean reported error %.5f, variance / OLS %.3f%n",
                    names[k], mean, mean - c.expected(), Math.sqrt(var / seeds),
                    (mean - c.expected()) / Math.sqrt(var / seeds), Math.sqrt(var), meanSe, var / olsVariance);
        }
    }

    static Estimate ordinary(DisplacementMoments m, int axis, double start, double end) {
        var e = LateWindowSlopeEstimator.estimate(m, axis, start, end);
        return new Estimate(e.value(), e.standardError());
    }

    /**
     * Half the generalized least-squares slope over [start, end]: weighted with the sample covariance of the
     * blocks' curves, or, for {@code model}, with the covariance of a diffusive curve,
     * Cov(X_s^2, X_t^2) = 2 Cov(X_s, X_t)^2, proportional to min(s, t)^2 for a Gaussian displacement with
     * independent increments. The standard error is always that of the weights applied to the sample
     * covariance, so model weights keep an honest interval.
     */
    static Estimate generalized(DisplacementMoments m, int axis, double start, double end, boolean model) {
        int r = m.records();
        double[][] cov = new double[r][r];
        for (int a = 0; a < r; a++) {
            for (int b = 0; b < r; b++) {
                cov[a][b] = m.covariance(axis, a, b);
            }
        }
        double[] w = model ? weights(m.times(), start, end, true) : weights(m.times(), start, end, cov);
        double slope = 0;
        double variance = 0;
        for (int a = 0; a < r; a++) {
            slope += w[a] * m.mean(axis, a);
            for (int b = 0; b < r; b++) {
                variance += w[a] * w[b] * cov[a][b];
            }
        }
        return new Estimate(0.5 * slope, 0.5 * Math.sqrt(Math.max(variance, 0) / m.count()));
    }
}
