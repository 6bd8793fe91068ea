package org.eddycast.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import java.util.random.RandomGenerator;
import java.util.random.RandomGeneratorFactory;
import org.eddycast.docs.ValidationLog;
import org.junit.jupiter.api.Test;

/**
 * The generated random Fourier field against its requested statistics: per-component variance, zero
 * divergence, energy spectrum and longitudinal integral length. Monte-Carlo checks use fixed seeds and
 * tolerances of four standard errors of the estimate, computed from the sample itself.
 */
class RandomFourierFieldTest {

    private static RandomGenerator rng(long seed) {
        return RandomGeneratorFactory.of("L64X128MixRandom").create(seed);
    }

    private static RandomFourierModel model(int dims) {
        SpectrumTable table = new SpectrumTable(new PowerLawBand(-5.0 / 3.0, 16), dims, 64);
        return new RandomFourierModel(table, 1.0, "test");
    }

    /**
     * The variance the realized modes give each component, exactly: with coefficients of stationary variance
     * sigma_m^2 and amplitudes a = alpha1 e1 + alpha2 e2 (b likewise), E[u_i^2 | modes] = sum_m sigma_m^2
     * (e1_i^2 + e2_i^2) at every point, since cos^2 + sin^2 = 1. Here sigma_m^2 is read from the prepared
     * transition, kick^2 / (1 - exp(-2 dt / tau)) (the Ornstein-Uhlenbeck step's definition), not from the
     * model's formula. Summed over the components it is d for every realization, to rounding (the polarizations
     * are unit vectors and the spectrum's weights sum to one); per component its mean over realizations is 1 by
     * isotropy, checked within four standard errors from the sample (about 0.003 over 2,000 realizations, where
     * sampling the velocity itself allowed about 9%).
     */
    @Test
    void eachComponentHasUnitVariance() {
        double dt = 0.01;
        for (int dims = 2; dims <= 3; dims++) {
            RandomFourierModel model = model(dims);
            ShearModeField field = new ShearModeField(dims, model.modeCount());
            RandomGenerator rng = rng(11);
            int realizations = 2000;
            double[][] sum = new double[dims][2];
            double transition = -Math.expm1(-2 * dt / model.correlationTime());
            for (int r = 0; r < realizations; r++) {
                model.realize(field, rng);
                field.prepareStep(dt);
                double[] variance = new double[3];
                for (int m = 0; m < model.modeCount(); m++) {
                    double s2 = field.kick[m] * field.kick[m] / transition;
                    variance[0] += s2 * (field.e1x[m] * field.e1x[m] + field.e2x[m] * field.e2x[m]);
                    variance[1] += s2 * (field.e1y[m] * field.e1y[m] + field.e2y[m] * field.e2y[m]);
                    variance[2] += s2 * (field.e1z[m] * field.e1z[m] + field.e2z[m] * field.e2z[m]);
                }
                assertEquals(dims, variance[0] + variance[1] + variance[2], 1e-12,
                        dims + "D: total variance of realization " + r);
                for (int a = 0; a < dims; a++) {
                    sum[a][0] += variance[a];
                    sum[a][1] += variance[a] * variance[a];
                }
            }
            for (int a = 0; a < dims; a++) {
                double mean = sum[a][0] / realizations;
                double se = Math.sqrt((sum[a][1] / realizations - mean * mean) / (realizations - 1));
                assertTrue(se < 0.005, "the check is as tight as planned: " + se);
                assertEquals(1.0, mean, 4 * se, dims + "D component " + a + " variance");
            }
        }
    }

    @Test
    void fieldIsDivergenceFree() {
        RandomFourierModel model = model(3);
        ShearModeField field = new ShearModeField(3, model.modeCount());
        model.realize(field, rng(5));
        field.prepareStep(0.01);
        SplittableRandom points = new SplittableRandom(6);
        double h = 1e-4;
        double[] plus = new double[3];
        double[] minus = new double[3];
        for (int trial = 0; trial < 200; trial++) {
            double[] x = {points.nextDouble(10), points.nextDouble(10), points.nextDouble(10)};
            double divergence = 0;
            double gradientScale = 0;
            for (int a = 0; a < 3; a++) {
                double[] xp = x.clone();
                double[] xm = x.clone();
                xp[a] += h;
                xm[a] -= h;
                field.velocityAt(xp, plus);
                field.velocityAt(xm, minus);
                double d = (plus[a] - minus[a]) / (2 * h);
                divergence += d;
                gradientScale += Math.abs(d);
            }
            // Central differences err by h^2 |u'''| / 6; with |k| up to about 20, that is below 1e-5 here.
            assertTrue(Math.abs(divergence) < 1e-5 * Math.max(1, gradientScale),
                    "divergence " + divergence + " at trial " + trial);
        }
    }

    @Test
    void polarizationsAreNormalToTheirWavevectors() {
        RandomFourierModel model = model(3);
        ShearModeField field = new ShearModeField(3, model.modeCount());
        model.realize(field, rng(8));
        field.prepareStep(0.01);
        double[] k = new double[3];
        double[] a = new double[3];
        double[] b = new double[3];
        for (int m = 0; m < model.modeCount(); m++) {
            field.wavevector(m, k);
            field.amplitudes(m, a, b);
            double kk = Math.sqrt(k[0] * k[0] + k[1] * k[1] + k[2] * k[2]);
            assertEquals(0.0, (k[0] * a[0] + k[1] * a[1] + k[2] * a[2]) / kk, 1e-13);
            assertEquals(0.0, (k[0] * b[0] + k[1] * b[1] + k[2] * b[2]) / kk, 1e-13);
        }
    }

    /**
     * The energy-weighted wavenumber distribution of the sampled modes against the power law's own integral:
     * for E ~ k^s on [1, r], the energy between k1 and k2 is (k2^(s+1) - k1^(s+1)) / (r^(s+1) - 1).
     */
    @Test
    void sampledSpectrumFollowsThePowerLaw() {
        double slope = -5.0 / 3.0;
        double ratio = 16;
        SpectrumTable table = new SpectrumTable(new PowerLawBand(slope, ratio), 3, 64);
        RandomFourierModel model = new RandomFourierModel(table, 1.0, "test");
        ShearModeField field = new ShearModeField(3, 64);
        RandomGenerator rng = rng(21);
        double scale = table.shapeIntegralLength();
        int bands = 8;
        double[] energy = new double[bands];
        double total = 0;
        double[] k = new double[3];
        double[] a = new double[3];
        double[] b = new double[3];
        for (int r = 0; r < 2000; r++) {
            model.realize(field, rng);
            field.prepareStep(0.01);
            for (int m = 0; m < 64; m++) {
                field.wavevector(m, k);
                field.amplitudes(m, a, b);
                double kk = Math.sqrt(k[0] * k[0] + k[1] * k[1] + k[2] * k[2]) / scale;
                double e = a[0] * a[0] + a[1] * a[1] + a[2] * a[2] + b[0] * b[0] + b[1] * b[1] + b[2] * b[2];
                int band = (int) Math.min(bands - 1, Math.floor(Math.log(kk) / Math.log(ratio) * bands));
                energy[band] += e;
                total += e;
            }
        }
        for (int j = 0; j < bands; j++) {
            double k1 = Math.pow(ratio, (double) j / bands);
            double k2 = Math.pow(ratio, (double) (j + 1) / bands);
            double expected = (Math.pow(k2, slope + 1) - Math.pow(k1, slope + 1)) / (Math.pow(ratio, slope + 1) - 1);
            // 2000 realizations of Gaussian amplitudes: the energy fraction of a band scatters by about
            // sqrt(2 / (2000 * modes in band * 4)) relative; 5% is more than four such errors.
            assertEquals(expected, energy[j] / total, 0.05 * expected, "band " + j);
        }
    }

    /**
     * The integral length from its definition, L11 = integral_0^inf f(r) dr (Pope 2000, Turbulent Flows, eq.
     * 6.48 and 6.213), estimated from the realized modes: the spatial correlation of u1 along x of one
     * realization is sum_m (a_m1^2 + b_m1^2)/2 cos(k_m1 r), whose integral to R is
     * sum_m (a_m1^2 + b_m1^2)/2 sin(k_m1 R)/k_m1. Averaged over realizations it tends to L11 as R grows.
     * The field was normalised to L11 = 1; the check is independent of the normalising formula.
     */
    @Test
    void longitudinalIntegralLengthIsOne() {
        for (int dims = 2; dims <= 3; dims++) {
            RandomFourierModel model = model(dims);
            ShearModeField field = new ShearModeField(dims, 64);
            RandomGenerator rng = rng(31 + dims);
            int realizations = 20000;
            double cutoff = 60;
            double sum = 0;
            double sumSq = 0;
            double variance = 0;
            double[] k = new double[3];
            double[] a = new double[3];
            double[] b = new double[3];
            for (int r = 0; r < realizations; r++) {
                model.realize(field, rng);
                field.prepareStep(0.01);
                double integral = 0;
                for (int m = 0; m < 64; m++) {
                    field.wavevector(m, k);
                    field.amplitudes(m, a, b);
                    double energy = 0.5 * (a[0] * a[0] + b[0] * b[0]);
                    integral += energy * (Math.abs(k[0]) < 1e-12 ? cutoff : Math.sin(k[0] * cutoff) / k[0]);
                    variance += energy;
                }
                sum += integral;
                sumSq += integral * integral;
            }
            double meanIntegral = sum / realizations;
            double meanVariance = variance / realizations;
            double se = Math.sqrt((sumSq / realizations - meanIntegral * meanIntegral) / realizations);
            double l11 = meanIntegral / meanVariance;
            ValidationLog.exact(dims + "D random Fourier field, longitudinal integral length L11 / L",
                    "Pope 2000, Turbulent Flows, eq. 6.213: L11 = (pi / (2 u'^2)) integral of E(k)/k dk", 1.0, l11,
                    4 * se / meanVariance + 0.03, "4 standard errors over 20,000 realizations plus 0.03 for the "
                            + "finite integration range");
            assertEquals(1.0, l11, 4 * se / meanVariance + 0.03, dims + "D integral length");
        }
    }

    /**
     * Pope's model spectrum at high Reynolds number: the constants tend to c_L = 6.78 and c_eta = 0.40, and
     * L11 / l to about 0.43 (Pope 2000, Turbulent Flows, sec. 6.5.3; values from memory, so the tolerances
     * allow a few per cent).
     */
    @Test
    void popeModelConstantsAtHighReynoldsNumber() {
        PopeModelSpectrum p = new PopeModelSpectrum(1e5);
        String pope = "Pope 2000, Turbulent Flows, sec. 6.5.3 (from memory)";
        ValidationLog.exact("model spectrum constant c_L at high Reynolds number", pope, 6.78, p.cL(), 0.15,
                "within 0.15 (value from memory)");
        ValidationLog.exact("model spectrum constant c_eta at high Reynolds number", pope, 0.40, p.cEta(), 0.01,
                "within 0.01 (value from memory)");
        ValidationLog.exact("model spectrum L11 / l at high Reynolds number", pope, 0.43, 1e5 / p.energyLength(),
                0.01, "within 0.01 (value from memory)");
        assertEquals(6.78, p.cL(), 0.15);
        assertEquals(0.40, p.cEta(), 0.01);
        assertEquals(0.43, 1e5 / p.energyLength(), 0.01);
    }
}
