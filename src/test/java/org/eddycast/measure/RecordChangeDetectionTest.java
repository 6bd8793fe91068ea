package org.eddycast.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.FilterReader;
import java.io.IOException;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.FileTime;
import java.util.function.UnaryOperator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A record file that is written to while it is being read is rejected with a message saying what to do. */
class RecordChangeDetectionTest {

    @TempDir
    Path folder;

    private Path record() throws IOException {
        StringBuilder sb = new StringBuilder("time [s], u [m/s]\n");
        for (int i = 0; i < 200; i++) {
            sb.append(String.format(java.util.Locale.ROOT, "%.3f, %.4f%n", i * 0.01, Math.sin(0.3 * i)));
        }
        Path file = folder.resolve("probe.csv");
        Files.writeString(file, sb.toString(), StandardCharsets.UTF_8);
        Files.setLastModifiedTime(file, FileTime.fromMillis(1_700_000_000_000L));
        return file;
    }

    /** A reader that runs {@code action} once, after the first characters have been read. */
    private static UnaryOperator<Reader> actingAfterFirstRead(Runnable action) {
        return in -> new FilterReader(in) {
            private boolean done;

            @Override
            public int read(char[] buffer, int offset, int length) throws IOException {
                int n = super.read(buffer, offset, length);
                if (!done) {
                    done = true;
                    action.run();
                }
                return n;
            }
        };
    }

    private static void run(IoAction a) {
        try {
            a.run();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private interface IoAction {
        void run() throws IOException;
    }

    @Test
    void anUnchangedFileIsRead() throws IOException {
        Path file = record();
        VelocityRecord r = new RecordReader().read(file, actingAfterFirstRead(() -> { }));
        assertEquals(200, r.sampleCount());
    }

    @Test
    void rowsAppendedWhileReadingAreDetected() throws IOException {
        Path file = record();
        RecordFormatException e = assertThrows(RecordFormatException.class, () -> new RecordReader().read(file,
                actingAfterFirstRead(() -> run(() -> Files.writeString(file, "2.000, 0.5\n", StandardOpenOption.APPEND)))));
        assertTrue(e.getMessage().startsWith("the record file " + file + " changed while it was being read"),
                e.getMessage());
        assertTrue(e.getMessage().contains("wait until the program writing it has finished, or read a copy of it"),
                e.getMessage());
        assertEquals(0, e.getLine(), "not tied to one line");
    }

    /** A rewrite of the same length is caught by the modification time. */
    @Test
    void aSameSizeRewriteIsDetected() throws IOException {
        Path file = record();
        long size = Files.size(file);
        RecordFormatException e = assertThrows(RecordFormatException.class, () -> new RecordReader().read(file,
                actingAfterFirstRead(() -> run(() -> {
                    String text = Files.readString(file).replace("0.000, ", "0.000,-");
                    Files.writeString(file, text.substring(0, (int) size));
                }))));
        assertEquals(size, Files.size(file));
        assertTrue(e.getMessage().contains("changed while it was being read"), e.getMessage());
    }
}
