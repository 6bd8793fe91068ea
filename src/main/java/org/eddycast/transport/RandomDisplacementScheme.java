package org.eddycast.transport;

/**
 * One time step of the random-displacement model dX = (u + div K) dt + sqrt(2 K) dW for a diagonal
 * diffusivity K(x), with mirror reflection at the walls.
 *
 * <p>The Ito drift div K (for a diagonal tensor, dK_ii/dx_i along axis i) is what keeps a tracer that is
 * spread uniformly through the region uniform wherever the diffusivity varies: the well-mixed criterion of
 * Thomson 1987 ("Criteria for the selection of stochastic models of particle trajectories in turbulent flows",
 * J. Fluid Mech. 180:529-556), which for a random-displacement model is met by exactly this drift. The
 * diffusivity of the random step is taken at X + (1/2) div K dt, the scheme of Visser 1997 ("Using random walk
 * models to simulate the vertical distribution of particles in a turbulent water column", Mar. Ecol. Prog.
 * Ser. 158:275-281), which keeps particles from collecting where K is small and its gradient large, for
 * example at a bed where K vanishes. The mean velocity is the average of its values at the start and at a
 * predicted end of the step (Heun's predictor-corrector, the same random displacement in both), so a particle
 * carried through a shear layer sees the velocity along its path and curved streamlines are followed to
 * second order.
 *
 * <p>A random-displacement model holds for times long against the local Lagrangian time scale; the transport
 * stage is used for the spreading over a channel's section and a tank's circulation, whose times are many
 * Lagrangian time scales.
 *
 * <p>Owned by one thread: it keeps two small work arrays.
 */
public final class RandomDisplacementScheme {

    private final TransportModel model;
    private final double dt;
    private final double[] values = new double[9];
    private final double[] probe = new double[3];

    public RandomDisplacementScheme(TransportModel model, double dt) {
        if (!(dt > 0) || !Double.isFinite(dt)) {
            throw new IllegalArgumentException("transport time step must be positive and finite; got " + dt);
        }
        this.model = model;
        this.dt = dt;
    }

    /**
     * Advances particles {@code [0, count)} by one step.
     *
     * @param normals 3 x count standard normal variates: particle i uses normals[3i], [3i+1], [3i+2]
     */
    public void step(double[] x, double[] y, double[] z, int count, double[] normals) {
        double half = 0.5 * dt;
        double[] p = probe;
        double[] e = values;
        for (int i = 0; i < count; i++) {
            double xi = x[i];
            double yi = y[i];
            double zi = z[i];
            model.evaluate(xi, yi, zi, e);
            double ux = e[0];
            double uy = e[1];
            double uz = e[2];
            double gx = e[6];
            double gy = e[7];
            double gz = e[8];
            p[0] = xi + half * gx;
            p[1] = yi + half * gy;
            p[2] = zi + half * gz;
            model.reflect(p);
            model.diffusivity(p[0], p[1], p[2], e);
            int n = 3 * i;
            double sx = Math.sqrt(2 * e[3] * dt) * normals[n] + gx * dt;
            double sy = Math.sqrt(2 * e[4] * dt) * normals[n + 1] + gy * dt;
            double sz = Math.sqrt(2 * e[5] * dt) * normals[n + 2] + gz * dt;
            p[0] = xi + ux * dt + sx;
            p[1] = yi + uy * dt + sy;
            p[2] = zi + uz * dt + sz;
            model.reflect(p);
            model.velocity(p[0], p[1], p[2], e);
            p[0] = xi + half * (ux + e[0]) + sx;
            p[1] = yi + half * (uy + e[1]) + sy;
            p[2] = zi + half * (uz + e[2]) + sz;
            model.reflect(p);
            x[i] = p[0];
            y[i] = p[1];
            z[i] = p[2];
        }
    }

    public double timeStep() {
        return dt;
    }
}
