package org.eddycast.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eddycast.particles.RecordSchedule;
import org.junit.jupiter.api.Test;

/**
 * The measurement's fixed weights are slopes: on any straight line c + s t they give s exactly (weights summing
 * to zero, first moment one), so a difference between estimators comes from the curve, not from the weights.
 */
class BenchmarkEstimatorVarianceTest {

    @Test
    void fixedWeightsRecoverTheSlopeOfAnyLine() {
        double[] times = RecordSchedule.forSteps(800).times(0.05);
        double end = times[times.length - 1];
        for (boolean model : new boolean[] {false, true}) {
            for (double start : new double[] {end / 4, end / 2}) {
                double[] w = BenchmarkEstimatorVariance.weights(times, start, end, model);
                double sum = 0;
                double first = 0;
                for (int j = 0; j < w.length; j++) {
                    sum += w[j];
                    first += w[j] * times[j];
                }
                assertEquals(0.0, sum * end, 1e-9, "weights sum to zero");
                assertEquals(1.0, first, 1e-9, "first moment one");
            }
        }
    }
}
