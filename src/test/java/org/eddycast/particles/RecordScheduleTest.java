package org.eddycast.particles;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The record schedule's stated properties: steps strictly increasing from step 1 to the last step, about 128
 * records whatever the run length, 80 uniform records j S / 80 for the late-window slope, and a geometric start
 * dense enough to resolve the ballistic growth (memory stays bounded whatever the run length).
 */
class RecordScheduleTest {

    @ParameterizedTest(name = "{0} steps")
    @ValueSource(ints = {2, 3, 80, 81, 500, 2000, 100_000})
    void stepsIncreaseFromOneToTheLastStep(int total) {
        RecordSchedule s = RecordSchedule.forSteps(total);
        assertEquals(1, s.step(0), "the first step is recorded");
        assertEquals(total, s.step(s.size() - 1), "the last step is recorded");
        for (int j = 1; j < s.size(); j++) {
            assertTrue(s.step(j) > s.step(j - 1), "strictly increasing at record " + j);
        }
        assertTrue(s.size() <= RecordSchedule.TARGET_RECORDS + 8 + 80, "bounded: " + s.size());
        assertTrue(s.size() <= total, "no more records than steps");
    }

    @ParameterizedTest(name = "{0} steps")
    @ValueSource(ints = {500, 2000, 100_000})
    void longRunsHaveAtMostAboutOneHundredAndTwentyEightRecords(int total) {
        RecordSchedule s = RecordSchedule.forSteps(total);
        assertTrue(s.size() <= RecordSchedule.TARGET_RECORDS + 8, "records: " + s.size());
        // Every uniform record j S / 80 is present.
        int found = 0;
        for (int j = 1; j <= 80; j++) {
            long wanted = Math.round((double) j * total / 80);
            for (int r = 0; r < s.size(); r++) {
                if (s.step(r) == wanted) {
                    found++;
                    break;
                }
            }
        }
        assertEquals(80, found, "the uniform records of the late window");
        // The geometric start: the first tenth of the run holds at least a quarter of the records.
        int early = 0;
        for (int r = 0; r < s.size(); r++) {
            if (s.step(r) <= total / 10) {
                early++;
            }
        }
        assertTrue(early >= s.size() / 4, "records in the first tenth: " + early + " of " + s.size());
    }

    @Test
    void timesAreStepsTimesTheStep() {
        RecordSchedule s = RecordSchedule.forSteps(2000);
        double[] t = s.times(0.02);
        assertEquals(s.size(), t.length);
        for (int j = 0; j < t.length; j++) {
            assertEquals(s.step(j) * 0.02, t[j], 0.0);
        }
        assertEquals(40.0, t[t.length - 1], 1e-12);
    }

    @Test
    void aRunNeedsTwoSteps() {
        assertEquals("a run needs at least 2 steps; got 1",
                assertThrows(IllegalArgumentException.class, () -> RecordSchedule.forSteps(1)).getMessage());
    }
}
