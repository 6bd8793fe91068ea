package org.eddycast.uncertainty;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.eddycast.uncertainty.UncertaintySummary.FigureRange;
import org.eddycast.uncertainty.UncertaintySummary.RangedInput;
import org.eddycast.uncertainty.UncertaintySummary.SensitivityIndex;

/**
 * An invented uncertainty summary for the tests of its displays, computed with this package's own mathematics
 * from a closed-form stand-in for a study: the 95% blend time of a baffled tank, N theta_95 = 5.20 Po^(-1/3)
 * (T/D)^2 (Grenville 1992, from memory), with four ranged inputs. The input names, ranges and the Monte Carlo
 * interval are made up for the example; nothing here is a result of the tool.
 */
public final class ExampleUncertainty {

    private ExampleUncertainty() {
    }

    private static final List<String> NAMES = List.of("flow.impeller.powerNumber", "flow.impeller.speed",
            "flow.impeller.diameter", "flow.tank.diameter");
    private static final List<InputDistribution> RANGES = List.of(new UniformRange(1.0, 1.6),
            new NormalRange(1.0, 0.03), new TriangularRange(0.95, 1.0, 1.05), new UniformRange(2.45, 2.55));
    private static final double[] NOMINAL = {1.27, 1.0, 1.0, 2.5};

    private static double blendTime(double[] x) {
        double ratio = x[3] / x[2];
        return 5.20 * Math.pow(x[0], -1.0 / 3) * ratio * ratio / x[1];
    }

    /** The summary of 512 base samples (3,072 runs) over the four inputs. */
    public static UncertaintySummary blendTimeStudy() {
        SaltelliDesign design = new SaltelliDesign(512, NAMES.size());
        double[] y = new double[design.rows()];
        for (int row = 0; row < y.length; row++) {
            y[row] = blendTime(design.point(row, RANGES));
        }
        SobolIndices s = SobolIndices.estimate(design, y, 42L);
        double[] propagated = new double[2 * design.baseSamples()];
        System.arraycopy(y, 0, propagated, 0, propagated.length);
        SampleSummary sample = SampleSummary.of(propagated);
        double nominal = blendTime(NOMINAL);
        FigureRange blend = new FigureRange("blendTime95", "95% blend time", "s", nominal, 0.97 * nominal,
                1.03 * nominal, sample.mean(), sample.p05(), sample.p50(), sample.p95(), 0.05);
        List<RangedInput> inputs = new ArrayList<>();
        List<SensitivityIndex> indices = new ArrayList<>();
        for (int i = 0; i < NAMES.size(); i++) {
            inputs.add(new RangedInput(NAMES.get(i), NOMINAL[i], RANGES.get(i).describe(),
                    i == 0 ? "from memory" : "common practice"));
            indices.add(new SensitivityIndex(NAMES.get(i), s.first()[i], s.firstHalfWidth()[i], s.total()[i],
                    s.totalHalfWidth()[i]));
        }
        indices.sort((a, b) -> Double.compare(b.total(), a.total()));
        String advice = NarrowingAdvice.sentence(NAMES, s.total(), sample.p05(), sample.p95(),
                v -> String.format(Locale.ROOT, "%.1f s", v));
        return new UncertaintySummary(inputs, design.baseSamples(), design.rows(), 1024, List.of(blend), indices,
                advice, List.of("An invented example for the display tests."));
    }

    /** The same study with its figures but without a ranking (no indices, no advice). */
    public static UncertaintySummary withoutRanking() {
        UncertaintySummary u = blendTimeStudy();
        return new UncertaintySummary(u.inputs(), u.baseSamples(), u.runs(), u.particles(), u.figures(), List.of(),
                "", u.notes());
    }
}
