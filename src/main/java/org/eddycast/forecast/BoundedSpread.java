package org.eddycast.forecast;

import org.apache.commons.math3.special.Erf;

/**
 * The variance of a tracer released at x0 between two reflecting walls at 0 and L, when free spreading would
 * give it variance s2 = 2 D t: the cloud cannot grow wider than its container, and its variance tends to that
 * of a uniform distribution, L^2 / 12.
 *
 * <p>From the cosine series of the density (Crank 1975, The Mathematics of Diffusion, Oxford, ch. 4),
 * p(x) = 1/L + (2/L) sum_n cos(n pi x0 / L) cos(n pi x / L) e_n with e_n = exp(-n^2 pi^2 s2 / (2 L^2)), and the
 * integrals of x cos(n pi x / L) and x^2 cos(n pi x / L) over [0, L], L^2 ((-1)^n - 1) / (n pi)^2 and
 * 2 L^3 (-1)^n / (n pi)^2:
 * E[x] = L/2 + 2 L sum_n c_n e_n ((-1)^n - 1) / (n pi)^2 and E[x^2] = L^2/3 + 4 L^2 sum_n c_n e_n (-1)^n / (n pi)^2.
 * While the cloud is far from both walls (sqrt(s2) below a tenth of the distance to the nearer wall) the free
 * variance is returned unchanged; the images it ignores then weigh less than e^-50. While it is far from the
 * farther wall only, it is a normal cloud folded at the nearer wall, whose variance has a closed form
 * (Leone, Nelson &amp; Nottingham 1961, The folded normal distribution, Technometrics 3:543, from memory):
 * with d the distance to the wall and s = sqrt(s2), E|X| = s sqrt(2/pi) exp(-d^2 / (2 s^2)) + d erf(d / (s sqrt 2))
 * and Var = d^2 + s^2 - (E|X|)^2. The cosine series is summed only when the cloud reaches across the gap
 * (s at least a twentieth of L), where it needs at most about 60 terms: the work is bounded at every time.
 */
public final class BoundedSpread {

    private BoundedSpread() {
    }

    /**
     * @param length   L (m), positive
     * @param release  x0 (m), 0 to L
     * @param variance the free-spreading variance 2 D t (m^2), not negative
     * @return the variance of the bounded cloud about its own centre (m^2)
     */
    public static double variance(double length, double release, double variance) {
        Checks.positive("length", length, "m");
        if (!(release >= 0 && release <= length)) {
            throw new IllegalArgumentException("release must lie between the walls, 0 to " + length + " m; got "
                    + release);
        }
        if (!(variance >= 0)) {
            throw new IllegalArgumentException("variance must not be negative; got " + variance);
        }
        double nearer = Math.min(release, length - release);
        if (Math.sqrt(variance) < 0.1 * nearer) {
            return variance;
        }
        double farther = Math.max(release, length - release);
        double s = Math.sqrt(variance);
        if (s < 0.1 * farther) {
            double z = nearer / (s * Math.sqrt(2));
            double meanDistance = s * Math.sqrt(2 / Math.PI) * Math.exp(-z * z) + nearer * Erf.erf(z);
            return Math.max(0, nearer * nearer + variance - meanDistance * meanDistance);
        }
        double mean = length / 2;
        double second = length * length / 3;
        double decayPerN2 = Math.PI * Math.PI * variance / (2 * length * length);
        for (int n = 1; n < 1_000_000; n++) {
            double e = Math.exp(-decayPerN2 * n * n);
            double npi = n * Math.PI;
            double c = Math.cos(npi * release / length) * e / (npi * npi);
            double sign = (n & 1) == 0 ? 1 : -1;
            mean += 2 * length * c * (sign - 1);
            second += 4 * length * length * c * sign;
            if (e < 1e-17 && n > 3) {
                break;
            }
        }
        return Math.max(0, second - mean * mean);
    }
}
