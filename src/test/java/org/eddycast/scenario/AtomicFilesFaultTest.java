package org.eddycast.scenario;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Faults while saving: an interrupted save, a full disk and a folder that cannot be written leave the previous
 * file byte for byte as it was, no temporary file behind, and a message naming the file and what to do.
 */
class AtomicFilesFaultTest {

    @TempDir
    Path folder;

    private Path existingScenario() throws IOException {
        Path file = folder.resolve("tank.json");
        ScenarioWriter.write(ScenarioReader.parse(ScenarioReaderTest.EXAMPLE), file);
        return file;
    }

    private List<Path> filesIn(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.sorted().toList();
        }
    }

    @Test
    void aSaveInterruptedHalfwayLeavesThePreviousFileIntact() throws IOException {
        Path file = existingScenario();
        byte[] before = Files.readAllBytes(file);
        byte[] replacement = "{ \"version\": 1, \"name\": \"half written\" }".getBytes(StandardCharsets.UTF_8);
        IllegalStateException e = assertThrows(IllegalStateException.class, () -> AtomicFiles.write(file, out -> {
            out.write(replacement, 0, replacement.length / 2);
            throw new IllegalStateException("interrupted midway");
        }));
        assertEquals("interrupted midway", e.getMessage());
        assertArrayEquals(before, Files.readAllBytes(file));
        assertEquals(List.of(file), filesIn(folder), "a temporary file was left behind");
        // the previous file still reads as the same scenario
        assertEquals(ScenarioWriter.text(ScenarioReader.parse(ScenarioReaderTest.EXAMPLE)),
                ScenarioWriter.text(ScenarioReader.read(file)));
    }

    @Test
    void theShutdownHookRemovesTheTemporaryFileOfASaveInProgress() throws IOException {
        // Ctrl-C while a file is written runs the shutdown hooks while the write is still in its content: the
        // hook's body must leave no .part file, and the previous file as it was
        Path file = existingScenario();
        byte[] before = Files.readAllBytes(file);
        List<List<Path>> during = new java.util.ArrayList<>();
        assertThrows(IOException.class, () -> AtomicFiles.write(file, out -> {
            out.write(new byte[] {'{'});
            assertTrue(filesIn(folder).stream().anyMatch(p -> p.toString().endsWith(".part")));
            AtomicFiles.removeUnfinished();
            during.add(filesIn(folder));
        }));
        assertEquals(List.of(file), during.get(0), "a .part file outlived the shutdown hook");
        assertArrayEquals(before, Files.readAllBytes(file));
        assertEquals(List.of(file), filesIn(folder));
    }

    @Test
    void aFullDiskGivesAMessageNamingTheFileAndWhatToDo() throws IOException {
        Path file = existingScenario();
        byte[] before = Files.readAllBytes(file);
        IOException e = assertThrows(IOException.class, () -> AtomicFiles.write(file, out -> {
            out.write(new byte[4096]);
            throw new IOException("No space left on device");
        }));
        String m = e.getMessage();
        assertTrue(m.contains(file.toAbsolutePath().toString()), m);
        assertTrue(m.contains("the disk is full (free some space or save to another drive)"), m);
        assertTrue(m.contains("the previous tank.json is unchanged"), m);
        assertArrayEquals(before, Files.readAllBytes(file));
        assertEquals(List.of(file), filesIn(folder));
    }

    @Test
    void aNewFileThatCannotBeWrittenLeavesNothingBehind() throws IOException {
        Path file = folder.resolve("new.csv");
        IOException e = assertThrows(IOException.class, () -> AtomicFiles.write(file, out -> {
            throw new IOException("No space left on device");
        }));
        assertTrue(e.getMessage().startsWith("could not save " + file.toAbsolutePath() + ": the disk is full"),
                e.getMessage());
        assertTrue(!e.getMessage().contains("unchanged"), "no previous file to speak of: " + e.getMessage());
        assertEquals(List.of(), filesIn(folder));
    }

    @Test
    void aMissingFolderIsNamed() {
        Path file = folder.resolve("absent").resolve("x.json");
        IOException e = assertThrows(IOException.class, () -> AtomicFiles.writeString(file, "{}"));
        assertTrue(e.getMessage().contains("the folder " + folder.resolve("absent") + " does not exist"),
                e.getMessage());
    }

    /** The operating system's reasons for a folder that cannot be written map to advice naming the folder. */
    @Test
    void readOnlyAndPermissionFaultsSayWhatToDo() {
        Path file = folder.resolve("tank.json");
        String denied = AtomicFiles.explain(file, new AccessDeniedException(folder.resolve(".tank.json.1.part")
                .toString())).getMessage();
        assertTrue(denied.startsWith("could not save " + file + ": permission denied in " + folder
                + " (choose a folder you may write to)"), denied);
        String readOnly = AtomicFiles.explain(file, new FileSystemException(file.toString(), null,
                "Read-only file system")).getMessage();
        assertTrue(readOnly.contains("the drive is read-only (choose a folder on a writable drive)"), readOnly);
        String other = AtomicFiles.explain(file, new IOException("Input/output error")).getMessage();
        assertTrue(other.contains("could not be written") && other.endsWith("[Input/output error]"), other);
    }

    /** A real read-only folder (skipped where the user may write anywhere, as the superuser may). */
    @Test
    void aReadOnlyFolderIsReportedAndTheFileKept() throws IOException {
        Path file = existingScenario();
        byte[] before = Files.readAllBytes(file);
        Files.setPosixFilePermissions(folder, PosixFilePermissions.fromString("r-xr-xr-x"));
        try {
            Assumptions.assumeFalse(Files.isWritable(folder), "this user may write in a read-only folder");
            IOException e = assertThrows(IOException.class, () -> AtomicFiles.writeString(file, "{}"));
            assertTrue(e.getMessage().contains("permission denied in " + folder), e.getMessage());
            assertArrayEquals(before, Files.readAllBytes(file));
        } finally {
            Files.setPosixFilePermissions(folder, PosixFilePermissions.fromString("rwxr-xr-x"));
        }
    }
}
