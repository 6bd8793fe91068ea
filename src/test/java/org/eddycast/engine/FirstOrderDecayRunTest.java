package org.eddycast.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.transport.StationCurve;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * A channel run with a first-order loss against the same run without: the same seed gives the same particles, so
 * every concentration must be the conservative one times exp(-k t) (the solution of dc/dt = -k c), the widths and
 * the distance to mixed must not move, the dose plan must grow by the loss at the station's peak, and the forecast
 * must say so in its own assumption line.
 */
class FirstOrderDecayRunTest {

    private static final String CHANNEL = """
            { "version": 1, "name": "decaying dye in a ditch",
              "flow": { "kind": "channel", "depth": 1.0, "width": 5.0, "meanVelocity": 0.4, "bedSlope": 2.0e-4 },
              "substance": { "molecularDiffusivity": 4.0e-10 LOSS },
              "release": { "mass": 0.01 },
              "forecast": { "stations": [ { "distance": 150 } ], "targetPeak": 2.0e-6 },
              "simulation": { "particles": 1024, "seed": 3 } }
            """;
    private static final double HALF_LIFE = 600;

    private static StudyResult plain;
    private static StudyResult decayed;

    @BeforeAll
    static void run() {
        plain = Engine.run(ScenarioReader.parse(CHANNEL.replace("LOSS", "")), 2, RunListener.NONE,
                new Cancellation());
        decayed = Engine.run(ScenarioReader.parse(CHANNEL.replace("LOSS", ", \"halfLife\": " + HALF_LIFE)), 2,
                RunListener.NONE, new Cancellation());
    }

    private static double k() {
        return Math.log(2) / HALF_LIFE;
    }

    @Test
    void stationCurvesAreTheConservativeOnesTimesTheLoss() {
        StationCurve a = plain.answers().stations().get(0).curve();
        StationCurve b = decayed.answers().stations().get(0).curve();
        double[] t = a.times();
        for (int j = 0; j < t.length; j++) {
            double expected = a.concentration()[j] * Math.exp(-k() * t[j]);
            assertEquals(expected, b.concentration()[j], 1e-12 * a.peak() + 1e-12 * expected, "record " + j);
        }
        assertTrue(b.peak() < a.peak() * Math.exp(-k() * 150 / 0.4 / 2), "a loss over about 375 s of travel");
        assertTrue(decayed.answers().stations().get(0).passage().peakTime()
                <= plain.answers().stations().get(0).passage().peakTime(), "the peak moves no later");
    }

    @Test
    void theDosePlanAccountsForTheLoss() {
        Answers.DosePlan p = plain.answers().dosePlan();
        Answers.DosePlan d = decayed.answers().dosePlan();
        double perKgPlain = plain.answers().stations().get(0).curve().peak() / 0.01;
        double perKgDecayed = decayed.answers().stations().get(0).curve().peak() / 0.01;
        assertEquals(2.0e-6 / perKgPlain, p.mass(), 1e-9 * p.mass());
        assertEquals(2.0e-6 / perKgDecayed, d.mass(), 1e-9 * d.mass());
        assertTrue(d.mass() > p.mass(), "more dye for the same peak once some of it is lost");
    }

    @Test
    void forecastPeaksDecayWidthsAndMixingDoNot() {
        double[] times = plain.forecast().times();
        double[] a = plain.forecast().peakConcentration();
        double[] b = decayed.forecast().peakConcentration();
        for (int j = 0; j < times.length; j++) {
            assertEquals(a[j] * Math.exp(-k() * times[j]), b[j], 1e-12 * a[j], "grid point " + j);
        }
        assertEquals(plain.forecast().width()[1][times.length - 1], decayed.forecast().width()[1][times.length - 1]);
        assertEquals(plain.forecast().mixing().get(0).value(), decayed.forecast().mixing().get(0).value());
    }

    @Test
    void theLossHasItsOwnAssumptionLine() {
        assertTrue(plain.forecast().assumptions().contains(FirstOrderDecay.CONSERVATIVE));
        assertFalse(decayed.forecast().assumptions().contains(FirstOrderDecay.CONSERVATIVE));
        assertTrue(decayed.forecast().assumptions().stream().noneMatch(l -> l.contains("conservative")),
                decayed.forecast().assumptions()::toString);
        assertTrue(decayed.forecast().assumptions().stream().anyMatch(l -> l.startsWith("first-order loss at k = "
                + ForecastBuilder.fmt(k()) + " 1/s (half-life 600 s)")), decayed.forecast().assumptions()::toString);
        assertTrue(decayed.answers().notes().stream().anyMatch(n -> n.contains("half-life")));
    }
}
