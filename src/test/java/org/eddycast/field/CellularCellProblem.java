package org.eddycast.field;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.DecompositionSolver;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;

/**
 * The effective diffusivity of the cellular flow psi = sin x sin y (u = (sin x cos y, -cos x sin y)) with
 * molecular diffusivity D0, from its cell problem solved by a Fourier-Galerkin method: an independent route to the
 * constant the verification suite checks the particle simulation against.
 *
 * <p>Cell problem (homogenization of periodic advection-diffusion: Bensoussan, Lions and Papanicolaou 1978,
 * Asymptotic Analysis for Periodic Structures, North-Holland; in this form Majda and Kramer 1999, "Simplified
 * models for turbulent diffusion", Phys. Rep. 314:237-574, sec. 2): the periodic corrector chi solves
 * -D0 lap chi + u . grad chi = u_x, and D_xx = D0 + &lt;u_x chi&gt; = D0 (1 + &lt;|grad chi|^2&gt;) (multiply by chi and
 * average: the advection term averages to zero for a divergence-free periodic u), where &lt;.&gt; is the average over
 * the cell.
 *
 * <p>Galerkin basis (Canuto, Hussaini, Quarteroni and Zang 1988, Spectral Methods in Fluid Dynamics, Springer,
 * ch. 2): chi is odd in x and even in y, like u_x, so chi = sum c_mn sin(m x) cos(n y), 1 &lt;= m &lt;= N,
 * 0 &lt;= n &lt;= N, and only m + n even is reached from u_x = sin x cos y. Expanding the products by the angle-sum
 * formulas, u . grad of the basis function (m, n) is
 * [(m - n) (m+1, n+1) + (m + n) (m+1, n-1) - (m + n) (m-1, n+1) - (m - n) (m-1, n-1)] / 4,
 * with cos(-y) = cos(y) folding n - 1 = -1 onto 1 and sin(0 x) = 0 dropping m - 1 = 0; the Laplacian is
 * diagonal, -(m^2 + n^2). Modes beyond N are dropped. The coupling joins only neighbouring m, so the system is
 * block tridiagonal in m (blocks of about N / 2 unknowns) and is solved by block elimination with dense LU
 * blocks.
 */
final class CellularCellProblem {

    private final double d0;
    private final int n;
    /** The Galerkin coefficients c[m][j] of sin(m x) cos(n_j y), n_j = parity(m) + 2 j. */
    private final double[][] c;

    private CellularCellProblem(double d0, int n, double[][] c) {
        this.d0 = d0;
        this.n = n;
        this.c = c;
    }

    /** Solves with modes up to N in each direction. */
    static CellularCellProblem solve(double d0, int modes) {
        int blocks = modes;
        RealMatrix[] diagonal = new RealMatrix[blocks + 2];
        RealMatrix[] lower = new RealMatrix[blocks + 2];
        RealMatrix[] upper = new RealMatrix[blocks + 2];
        for (int m = 1; m <= blocks; m++) {
            int size = size(m, modes);
            diagonal[m] = new Array2DRowRealMatrix(size, size);
            for (int j = 0; j < size; j++) {
                int ny = wavenumberY(m, j);
                diagonal[m].setEntry(j, j, d0 * (m * m + ny * ny));
            }
            if (m > 1) {
                lower[m] = new Array2DRowRealMatrix(size, size(m - 1, modes));
            }
            if (m < blocks) {
                upper[m] = new Array2DRowRealMatrix(size, size(m + 1, modes));
            }
        }
        // Column (source) by column: where u . grad sends the basis function (m, ny).
        for (int m = 1; m <= blocks; m++) {
            for (int j = 0; j < size(m, modes); j++) {
                int ny = wavenumberY(m, j);
                if (m + 1 <= blocks) {
                    add(lower[m + 1], m + 1, ny + 1, j, (m - ny) / 4.0, modes);
                    add(lower[m + 1], m + 1, Math.abs(ny - 1), j, (m + ny) / 4.0, modes);
                }
                if (m - 1 >= 1) {
                    add(upper[m - 1], m - 1, ny + 1, j, -(m + ny) / 4.0, modes);
                    add(upper[m - 1], m - 1, Math.abs(ny - 1), j, -(m - ny) / 4.0, modes);
                }
            }
        }
        RealVector[] rhs = new RealVector[blocks + 1];
        for (int m = 1; m <= blocks; m++) {
            rhs[m] = new ArrayRealVector(size(m, modes));
        }
        rhs[1].setEntry(0, 1.0); // u_x = sin x cos y: (m, n) = (1, 1), the first of block 1 (n = 1, 3, ...)
        // Block elimination: B'_m = B_m - L_m B'_{m-1}^-1 U_{m-1}, r'_m = r_m - L_m B'_{m-1}^-1 r'_{m-1}.
        DecompositionSolver[] reduced = new DecompositionSolver[blocks + 1];
        reduced[1] = new LUDecomposition(diagonal[1]).getSolver();
        for (int m = 2; m <= blocks; m++) {
            RealMatrix factor = lower[m].multiply(reduced[m - 1].getInverse());
            reduced[m] = new LUDecomposition(diagonal[m].subtract(factor.multiply(upper[m - 1]))).getSolver();
            rhs[m] = rhs[m].subtract(factor.operate(rhs[m - 1]));
        }
        double[][] c = new double[blocks + 1][];
        RealVector next = reduced[blocks].solve(rhs[blocks]);
        c[blocks] = next.toArray();
        for (int m = blocks - 1; m >= 1; m--) {
            next = reduced[m].solve(rhs[m].subtract(upper[m].operate(next)));
            c[m] = next.toArray();
        }
        return new CellularCellProblem(d0, modes, c);
    }

    /** Adds a coupling from source column j of block m +- 1 into the row of (m, ny) when ny is kept. */
    private static void add(RealMatrix block, int m, int ny, int column, double value, int modes) {
        if (ny <= modes && value != 0) {
            block.addToEntry(row(m, ny), column, value);
        }
    }

    /** Unknowns of block m: n = parity(m), parity(m) + 2, ... up to N. */
    private static int size(int m, int modes) {
        int first = m % 2;
        return (modes - first) / 2 + 1;
    }

    private static int wavenumberY(int m, int j) {
        return m % 2 + 2 * j;
    }

    private static int row(int m, int ny) {
        return (ny - m % 2) / 2;
    }

    /** D_xx = D0 + &lt;u_x chi&gt; = D0 + c_11 &lt;sin^2 x cos^2 y&gt; = D0 + c_11 / 4. */
    double diffusivity() {
        return d0 + c[1][0] / 4;
    }

    /**
     * D0 (1 + &lt;|grad chi|^2&gt;), the same diffusivity by the energy identity: each basis function contributes
     * c^2 m^2 / 2 (n = 0) or c^2 (m^2 + n^2) / 4 (n &gt; 0) to the cell average of |grad chi|^2. Agreement with
     * {@link #diffusivity()} checks the solve.
     */
    double diffusivityFromGradient() {
        double sum = 0;
        for (int m = 1; m <= n; m++) {
            for (int j = 0; j < c[m].length; j++) {
                int ny = wavenumberY(m, j);
                double weight = ny == 0 ? m * m / 2.0 : (m * m + ny * ny) / 4.0;
                sum += c[m][j] * c[m][j] * weight;
            }
        }
        return d0 * (1 + sum);
    }
}
