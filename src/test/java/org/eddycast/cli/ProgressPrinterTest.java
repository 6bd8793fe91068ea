package org.eddycast.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;

/**
 * When standard error is not a terminal, progress arrives as lines at a fixed interval by a timer, whether or
 * not the run reports anything meanwhile, and stops when the run ends. (The command line's interval is
 * {@link ProgressPrinter#LOG_INTERVAL_SECONDS} s; the test uses 20 ms.)
 */
class ProgressPrinterTest {

    @Test
    void aLineArrivesEveryIntervalWithoutAnyProgressCallAndStopsAtTheEnd() throws InterruptedException {
        StringWriter text = new StringWriter();
        PrintWriter err = new PrintWriter(text, true);
        ProgressPrinter p = ProgressPrinter.logging(err, 20);
        p.progress(0.35, null);
        long deadline = System.nanoTime() + 10_000_000_000L;
        while (text.toString().lines().count() < 3 && System.nanoTime() < deadline) {
            Thread.sleep(10);
        }
        p.finish();
        Thread.sleep(100);
        long lines = text.toString().lines().count();
        assertTrue(lines >= 3, text.toString());
        assertTrue(text.toString().startsWith("eddycast: running, 35% done after "), text.toString());
        Thread.sleep(100);
        assertEquals(lines, text.toString().lines().count(), "a line after the run ended");
        assertTrue(ProgressPrinter.LOG_INTERVAL_SECONDS <= 10);
    }
}
