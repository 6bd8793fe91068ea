package org.eddycast.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A saved file is readable as the user expects: new files rw-r--r--, replaced files keep their permissions. */
class AtomicFilesPermissionsTest {

    @Test
    void newFilesAreReadableAndReplacedFilesKeepTheirPermissions(@TempDir Path dir) throws Exception {
        Assumptions.assumeTrue(dir.getFileSystem().supportedFileAttributeViews().contains("posix"));
        Path fresh = dir.resolve("fresh.json");
        AtomicFiles.writeString(fresh, "{}");
        assertEquals("rw-r--r--", PosixFilePermissions.toString(Files.getPosixFilePermissions(fresh)));
        Path kept = dir.resolve("kept.json");
        Files.writeString(kept, "old");
        Files.setPosixFilePermissions(kept, PosixFilePermissions.fromString("rw-rw----"));
        AtomicFiles.writeString(kept, "new");
        assertEquals("rw-rw----", PosixFilePermissions.toString(Files.getPosixFilePermissions(kept)));
        assertEquals("new", Files.readString(kept));
    }
}
