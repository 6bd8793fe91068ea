package org.eddycast.transport;

import java.util.List;
import java.util.function.DoubleBinaryOperator;
import org.eddycast.particles.Cancellation;

/** Small helpers that run the transport stage on a section given by formulas. */
final class SectionRuns {

    private SectionRuns() {
    }

    /** A section of uniform depth whose velocity and diffusivities are formulas of (y, zeta). */
    static SectionFlow section(double width, double depth, DoubleBinaryOperator velocity,
                               DoubleBinaryOperator kx, DoubleBinaryOperator ky, DoubleBinaryOperator kz,
                               boolean uniformAcross) {
        return new SectionFlow() {
            @Override
            public double depth(double y) {
                return depth;
            }

            @Override
            public double width() {
                return width;
            }

            @Override
            public double velocity(double y, double zeta) {
                return velocity.applyAsDouble(y, zeta);
            }

            @Override
            public double diffusivity(int axis, double y, double zeta) {
                return (axis == 0 ? kx : axis == 1 ? ky : kz).applyAsDouble(y, zeta);
            }

            @Override
            public boolean uniformAcross() {
                return uniformAcross;
            }
        };
    }

    /** Particles spread evenly over the section at x = 0. */
    static ReleaseSampler evenlyOverSection(ChannelTransport model) {
        return (rng, x, y, z, count) -> {
            for (int i = 0; i < count; i++) {
                x[i] = 0;
                double yi;
                double zi;
                // rejection against the deepest vertical keeps the density uniform over the area
                do {
                    yi = rng.nextDouble() * model.width();
                    zi = -rng.nextDouble() * model.depthAt(model.width() * 0.5) * 1.0;
                } while (zi < -model.depthAt(yi));
                y[i] = yi;
                z[i] = zi;
            }
        };
    }

    /** Runs and returns the moments. */
    static CloudMoments run(ChannelTransport model, ReleaseSampler release, TransportSettings settings,
                            int threads) {
        CloudMoments m = new CloudMoments(model.meanVelocity(), settings.recordTimes(), settings.blocks());
        TransportRunner.run(model, release, settings, List.of(m), threads, f -> { }, new Cancellation());
        return m;
    }
}
