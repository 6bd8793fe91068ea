package org.eddycast.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import java.util.random.RandomGeneratorFactory;
import org.junit.jupiter.api.Test;

/**
 * The Ornstein-Uhlenbeck update of the mode coefficients (Uhlenbeck and Ornstein 1930, "On the theory of the
 * Brownian motion", Phys. Rev. 36:823-841): exactly, the per-lane update of every kernel against each lane's own
 * field updated by {@link ShearModeField#advanceAmplitudes} with the same variates; statistically, the
 * stationary variance sigma^2 and the lag correlation exp(-t / tau) of the process the kernels produce.
 */
class AmplitudeUpdateTest {

    private static final int MODES = 8;
    private static final int WIDTH = 64;
    private static final double DT = 0.02;
    /** Not 1, so that t / tau and t tau differ. */
    private static final double TAU = 0.5;

    private static final int[] COEFFICIENTS = {ModeLanes.ALPHA1, ModeLanes.BETA1, ModeLanes.ALPHA2, ModeLanes.BETA2};

    private static double coefficient(ShearModeField f, int q, int m) {
        return switch (q) {
            case ModeLanes.ALPHA1 -> f.alpha1[m];
            case ModeLanes.BETA1 -> f.beta1[m];
            case ModeLanes.ALPHA2 -> f.alpha2[m];
            default -> f.beta2[m];
        };
    }

    /**
     * Each lane holds its own realization; mode m of every lane is advanced with variates laid out as the lane
     * update reads them (alpha1, beta1, alpha2, beta2, each a run of WIDTH), and each lane's field with the same
     * variates in its own layout (each a run of MODES). The two must agree to rounding, coefficient by
     * coefficient, for the vector and the scalar kernel.
     */
    @Test
    void laneUpdateEqualsEachLanesOwnFieldUpdate() {
        for (ShearKernel kernel : new ShearKernel[] {new VectorShearKernel(), new ScalarShearKernel()}) {
            RandomFourierModel model = new RandomFourierModel(
                    new SpectrumTable(new PowerLawBand(-5.0 / 3.0, 16), 3, MODES), 0.5, "test");
            var rng = RandomGeneratorFactory.of("L64X128MixRandom").create(41);
            ShearModeField[] fields = new ShearModeField[WIDTH];
            ModeLanes lanes = new ModeLanes(3, MODES, WIDTH);
            for (int i = 0; i < WIDTH; i++) {
                fields[i] = new ShearModeField(3, MODES);
                model.realize(fields[i], rng);
                fields[i].prepareStep(DT);
                lanes.load(i, fields[i]);
            }
            SplittableRandom random = new SplittableRandom(42);
            double[][] own = new double[WIDTH][4 * MODES];
            for (int step = 0; step < 3; step++) {
                for (int m = 0; m < MODES; m++) {
                    double[] normals = new double[4 * WIDTH];
                    for (int j = 0; j < normals.length; j++) {
                        normals[j] = random.nextGaussian();
                    }
                    for (int q = 0; q < 4; q++) {
                        for (int i = 0; i < WIDTH; i++) {
                            own[i][q * MODES + m] = normals[q * WIDTH + i];
                        }
                    }
                    kernel.advance(lanes, m, normals);
                }
                for (int i = 0; i < WIDTH; i++) {
                    fields[i].advanceAmplitudes(own[i], 0);
                }
            }
            for (int i = 0; i < WIDTH; i++) {
                for (int m = 0; m < MODES; m++) {
                    for (int q : COEFFICIENTS) {
                        double expected = coefficient(fields[i], q, m);
                        double actual = lanes.data[(m * ModeLanes.FIELDS + q) * WIDTH + i];
                        assertEquals(expected, actual, 1e-14, kernel.name() + ": lane " + i + ", mode " + m
                                + ", coefficient " + q);
                    }
                }
            }
        }
    }

    /** A field of 64 modes, two polarizations, stationary standard deviations 0.5 to 1.5, tau = 0.5. */
    private static ShearModeField knownField(double[] sigma) {
        ShearModeField f = new ShearModeField(3, sigma.length);
        for (int m = 0; m < sigma.length; m++) {
            sigma[m] = 0.5 + m / (double) sigma.length;
            f.setMode(m, new double[] {0, 0, 1 + m}, new double[] {1, 0, 0}, new double[] {0, 1, 0}, sigma[m], TAU);
        }
        return f;
    }

    /**
     * From stationary draws, 160 realizations of 64 modes x 4 coefficients (N = 40,960 independent paths),
     * each coefficient standardised by its sigma: at t = 0 and t = 5 tau the mean square is 1 (stationary
     * variance), and at lag t = tau (25 steps of 0.02, tau = 0.5) the mean product z(0) z(t) is
     * exp(-1) = 0.3679. Each tolerance is four standard errors of the estimate, from the sample's own spread
     * (about 0.007 for the variances, 0.005 for the correlation). A decay rate 10% off moves the correlation by
     * 0.035 and the variance at 5 tau by 0.09.
     */
    @Test
    void stationaryVarianceAndLagCorrelationOfTheProcess() {
        for (ShearKernel kernel : new ShearKernel[] {new VectorShearKernel(), new ScalarShearKernel()}) {
            int modes = 64;
            double[] sigma = new double[modes];
            ShearModeField f = knownField(sigma);
            var rng = RandomGeneratorFactory.of("L64X128MixRandom").create(43);
            SplittableRandom random = new SplittableRandom(44);
            int lag = (int) Math.round(TAU / DT);
            int longLag = 5 * lag;
            double[] normals = new double[4 * modes];
            Moments start = new Moments();
            Moments correlation = new Moments();
            Moments late = new Moments();
            for (int r = 0; r < 160; r++) {
                f.drawStationaryCoefficients(rng);
                f.prepareStep(DT);
                double[] z0 = standardised(f, sigma);
                for (double z : z0) {
                    start.add(z * z);
                }
                for (int s = 1; s <= longLag; s++) {
                    for (int j = 0; j < normals.length; j++) {
                        normals[j] = random.nextGaussian();
                    }
                    kernel.advance(f, normals, 0);
                    if (s == lag) {
                        double[] z = standardised(f, sigma);
                        for (int j = 0; j < z.length; j++) {
                            correlation.add(z0[j] * z[j]);
                        }
                    }
                }
                for (double z : standardised(f, sigma)) {
                    late.add(z * z);
                }
            }
            String k = kernel.name();
            assertEquals(40960, correlation.n);
            assertEquals(1.0, start.mean(), 4 * start.standardError(), k + ": stationary draw, variance");
            assertEquals(1.0, late.mean(), 4 * late.standardError(), k + ": variance after 5 tau");
            assertEquals(Math.exp(-lag * DT / TAU), correlation.mean(), 4 * correlation.standardError(),
                    k + ": correlation at lag tau");
            assertTrue(correlation.standardError() < 0.006, "the check is as tight as planned");
        }
    }

    private static double[] standardised(ShearModeField f, double[] sigma) {
        int modes = sigma.length;
        double[] z = new double[4 * modes];
        for (int m = 0; m < modes; m++) {
            z[m] = f.alpha1[m] / sigma[m];
            z[modes + m] = f.beta1[m] / sigma[m];
            z[2 * modes + m] = f.alpha2[m] / sigma[m];
            z[3 * modes + m] = f.beta2[m] / sigma[m];
        }
        return z;
    }

    /** Sample mean and its standard error. */
    private static final class Moments {
        long n;
        double sum;
        double sumSq;

        void add(double v) {
            n++;
            sum += v;
            sumSq += v * v;
        }

        double mean() {
            return sum / n;
        }

        double standardError() {
            double m = mean();
            return Math.sqrt((sumSq / n - m * m) / (n - 1));
        }
    }
}
