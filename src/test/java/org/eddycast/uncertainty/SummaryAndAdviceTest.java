package org.eddycast.uncertainty;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;

/** The sample summary and the advice sentence on sets whose answers follow by hand. */
class SummaryAndAdviceTest {

    @Test
    void percentilesAreHyndmanAndFanTypeSeven() {
        // Type 7 (Hyndman & Fan 1996, The American Statistician 50:361): Q(p) = x_(h) + (h - floor h)
        // (x_(h+1) - x_(h)) with h = (n - 1) p + 1. For 1..20: p05 at h = 1.95 -> 1.95, p50 at h = 10.5 -> 10.5,
        // p95 at h = 19.05 -> 19.05; the mean is 10.5. The values are given shuffled.
        double[] v = new double[20];
        for (int i = 0; i < 20; i++) {
            v[i] = (i * 7) % 20 + 1;
        }
        SampleSummary s = SampleSummary.of(v);
        assertEquals(10.5, s.mean(), 1e-12);
        assertEquals(1.95, s.p05(), 1e-12);
        assertEquals(10.5, s.p50(), 1e-12);
        assertEquals(19.05, s.p95(), 1e-12);
        assertEquals(20, s.count());
        assertEquals(7.0, SampleSummary.of(new double[] {7}).p95(), 0);
    }

    @Test
    void summaryRefusesEmptyOrMissingValues() {
        assertThrows(IllegalArgumentException.class, () -> SampleSummary.of(new double[0]));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> SampleSummary.of(new double[] {1, Double.NaN}));
        assertTrue(e.getMessage().contains("value 1"), e.getMessage());
    }

    @Test
    void adviceNamesTheLargestTotalIndexAndTheNarrowedRange() {
        // S_T = 0.64: the width scales by sqrt(1 - 0.75 * 0.64) = sqrt(0.52) = 0.7211 about the middle 13,
        // so 11 to 15 becomes 13 -+ 2 * 0.7211 = 11.56 to 14.44.
        String s = NarrowingAdvice.sentence(List.of("flow.width", "flow.bedSlope", "tracer.mass"),
                new double[] {0.1, 0.64, 0.3}, 11, 15, v -> String.format(Locale.ROOT, "%.1f m", v));
        assertEquals("The answer is most sensitive to flow.bedSlope (total index 0.64); measuring it to half its"
                + " present spread would narrow the 5-95% range from 11.0 m to 15.0 m to about 11.6 m to 14.4 m.", s);
        assertEquals(1, NarrowingAdvice.mostSensitive(new double[] {0.1, 0.64, 0.3}));
        assertEquals(0, NarrowingAdvice.mostSensitive(new double[] {0.5, 0.5}));
    }

    @Test
    void adviceIsExactForALinearModelOfNormalInputs() {
        // f = x1 + x2 with sd 3 and 4: sd 5, S_T1 = 9/25, S_T2 = 16/25. Halving x2's sd gives sd sqrt(9 + 4) =
        // sqrt(13), and for a normal response the 5-95% width is proportional to the sd, so the narrowed width
        // is exactly sqrt(13)/5 of the old one = sqrt(1 - 0.75 * 16/25).
        double z = 1.6448536269514722;
        double wide = 2 * z * 5;
        double narrow = 2 * z * Math.sqrt(13);
        assertEquals(narrow / wide, NarrowingAdvice.narrowingFactor(16.0 / 25), 1e-15);
        String s = NarrowingAdvice.sentence(List.of("x1", "x2"), new double[] {0.36, 0.64}, -z * 5, z * 5,
                v -> String.format(Locale.ROOT, "%.3f", v));
        assertTrue(s.endsWith(String.format(Locale.ROOT, "to about %.3f to %.3f.", -narrow / 2, narrow / 2)), s);
    }

    @Test
    void adviceWhenNothingMovesTheAnswer() {
        String s = NarrowingAdvice.sentence(List.of("a", "b"), new double[] {0, 0}, 3, 3, Double::toString);
        assertTrue(s.startsWith("No input moves the answer"), s);
        assertThrows(IllegalArgumentException.class,
                () -> NarrowingAdvice.sentence(List.of("a"), new double[] {0.1, 0.2}, 0, 1, Double::toString));
        assertThrows(IllegalArgumentException.class, () -> NarrowingAdvice.mostSensitive(new double[] {Double.NaN}));
    }
}
