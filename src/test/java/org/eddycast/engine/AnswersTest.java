package org.eddycast.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eddycast.scenario.DisplayUnits;
import org.eddycast.transport.StationCurve;
import org.junit.jupiter.api.Test;

/**
 * The answers' arithmetic without a run: unit conversions (SI definitions: 1 kg/m^3 = 1 g/L = 1,000 mg/L =
 * 1,000,000 ug/L), the cap at the injected solution's concentration, and the rounding of the headline.
 */
class AnswersTest {

    private static StationCurve curve(double... values) {
        double[] t = new double[values.length];
        for (int j = 0; j < t.length; j++) {
            t[j] = 60 * (j + 1);
        }
        return new StationCurve(200, Double.NaN, t, values, values, values, new double[values.length],
                new double[values.length]);
    }

    @Test
    void displayUnitsFollowTheirDefinitions() {
        DisplayFormat f = new DisplayFormat(new DisplayUnits("ug/L", "min", "km"));
        assertEquals("3.4 ug/L", f.concentration(3.4e-6));
        assertEquals("7.5 min", f.time(450));
        assertEquals("0.2 km", f.distance(200));
        assertEquals("1.5 mg/L", new DisplayFormat(new DisplayUnits("mg/L", "h", "m")).concentration(1.5e-3));
        assertEquals("2 h", new DisplayFormat(new DisplayUnits("mg/L", "h", "m")).time(7200));
        assertEquals("130", DisplayFormat.round(131.7));
        assertEquals("2.0e+08", DisplayFormat.round(2e8));
    }

    @Test
    void stationCurveIsScaledByTheMassAndCappedAtTheStock() {
        Answers.StationAnswer a = AnswerBuilder.station(curve(0, 1, 4, 2, 0), 3.0, 10.0, 2.5);
        assertTrue(a.capped(), "3 kg gives 12 kg/m^3 at the peak, above the stock of 10");
        assertEquals(10.0, a.passage().peak(), 0);
        for (double c : a.curve().concentration()) {
            assertTrue(c <= 10.0, "value " + c);
        }
        assertEquals(3.0, a.curve().concentration()[1], 0, "values below the stock scale with the mass");
        Answers.StationAnswer free = AnswerBuilder.station(curve(0, 1, 4, 2, 0), 1.0, Double.POSITIVE_INFINITY,
                Double.NaN);
        assertFalse(free.capped());
        assertTrue(Double.isNaN(free.passage().arrival()), "no detection limit, no arrival");
    }
}
