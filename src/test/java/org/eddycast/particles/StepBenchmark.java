package org.eddycast.particles;

import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import java.util.random.RandomGeneratorFactory;
import org.eddycast.field.ModeLanes;
import org.eddycast.field.PowerLawBand;
import org.eddycast.field.RandomFourierModel;
import org.eddycast.field.ShearKernel;
import org.eddycast.field.ShearModeField;
import org.eddycast.field.SpectrumTable;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * JMH microbenchmarks of one particle step on one core, on the standard workload's field (3D, 64 modes,
 * power-law band with slope -5/3 and |k| in [1, 16], u' = 1, tau = 1, D0 = 0.01, dt = 0.02): a group of 64
 * particles sharing a realization, a block of 64 particles with one realization each, the drift passes alone,
 * and the normal variates. Scores are in operations per microsecond, where an operation is one mode-update
 * (one particle moved by one mode) or, for {@link #normals}, one variate; multiply by 1e6 for per second.
 * Several forks, because the compiled vector code differs from one start of the runtime to the next.
 * How to run: manual/performance.md.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 4, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(value = 3, jvmArgsAppend = {"--add-modules", "jdk.incubator.vector"})
public class StepBenchmark {

    static final int MODES = 64;
    static final int PARTICLES = 64;
    static final int UPDATES = MODES * PARTICLES;
    static final int VARIATES = 4096;
    static final double DT = 0.02;

    @Param({"euler", "lie", "strang"})
    public String integrator;

    ShearModeField field;
    ModeLanes lanes;
    ParticleBlock shared;
    ParticleBlock own;
    ParticleStepper stepper;
    ShearKernel kernel;
    Integrator scheme;
    NormalStream normals;
    double[] variates;

    @Setup(Level.Trial)
    public void prepare() {
        RandomFourierModel model = new RandomFourierModel(
                new SpectrumTable(new PowerLawBand(-5.0 / 3.0, 16), 3, MODES), 1.0, "benchmark");
        var rng = RandomGeneratorFactory.of("L64X128MixRandom").create(11);
        field = new ShearModeField(3, MODES);
        lanes = new ModeLanes(3, MODES, PARTICLES);
        for (int lane = 0; lane < PARTICLES; lane++) {
            model.realize(field, rng);
            field.prepareStep(DT);
            lanes.load(lane, field);
        }
        scheme = Integrator.fromKey(integrator);
        kernel = KernelChoice.fastest().newShearKernel();
        stepper = new ParticleStepper(scheme, DT, new double[] {0.01, 0.01, 0.01}, kernel);
        normals = KernelChoice.fastest().newNormalStream();
        normals.reseed(rng);
        variates = new double[VARIATES];
    }

    /** Particles back near the origin each iteration, so that the phases stay those of a run. */
    @Setup(Level.Iteration)
    public void place() {
        SplittableRandom random = new SplittableRandom(12);
        shared = new ParticleBlock(PARTICLES);
        own = new ParticleBlock(PARTICLES);
        double[] p = new double[3];
        for (int i = 0; i < PARTICLES; i++) {
            for (int a = 0; a < 3; a++) {
                p[a] = random.nextDouble(-5, 5);
            }
            shared.place(i, p);
            own.place(i, p);
        }
    }

    /** One full step of a group sharing one realization: drift, Brownian step, amplitude update. */
    @Benchmark
    @OperationsPerInvocation(UPDATES)
    public ParticleBlock sharedStep() {
        stepper.step(field, shared, PARTICLES, normals);
        return shared;
    }

    /** The drift pass alone of a group sharing one realization (amplitudes held). */
    @Benchmark
    @OperationsPerInvocation(UPDATES)
    public ParticleBlock sharedDrift() {
        stepper.driftOnly(field, shared, PARTICLES);
        return shared;
    }

    /** One full step of a block with one realization per particle. */
    @Benchmark
    @OperationsPerInvocation(UPDATES)
    public ParticleBlock ownStep() {
        stepper.step(lanes, own, normals);
        return own;
    }

    /** The drift pass alone of a block with one realization per particle (amplitudes held). */
    @Benchmark
    @OperationsPerInvocation(UPDATES)
    public ParticleBlock ownDrift() {
        lanes.setStepScale(scheme.stepScale(DT));
        scheme.drift(kernel, lanes, own);
        return own;
    }

    /** Normal variates in bulk, as the steps draw them (independent of the integrator). */
    @Benchmark
    @OperationsPerInvocation(VARIATES)
    public double[] normals() {
        normals.fill(variates, VARIATES);
        return variates;
    }
}
