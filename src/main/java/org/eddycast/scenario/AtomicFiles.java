package org.eddycast.scenario;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.Locale;

/**
 * Writes a file so that a reader sees either the old content or the whole new one, never a part: the bytes go
 * to a temporary file in the same folder, are forced to disk, and the temporary file is then moved over the
 * target. If anything fails (the content throws, the disk fills, the folder is read-only) the old file is left
 * as it was, the temporary file is removed, and the {@link IOException} names the file, the cause and what to
 * do about it.
 *
 * <p>Special cases: a missing folder is reported before anything is written; where the file system cannot
 * move atomically the move falls back to a plain replace (still after the new content is complete on disk).
 */
public final class AtomicFiles {

    /** Writes the content of a file. */
    @FunctionalInterface
    public interface Content {
        void writeTo(OutputStream out) throws IOException;
    }

    /** Temporary files being written now: removed by the shutdown hook if the process is stopped midway. */
    private static final java.util.Set<Path> UNFINISHED = java.util.concurrent.ConcurrentHashMap.newKeySet();

    static {
        // Ctrl-C (SIGINT) or SIGTERM while a file is written runs the shutdown hooks, not the finally blocks
        Runtime.getRuntime().addShutdownHook(new Thread(AtomicFiles::removeUnfinished, "eddycast-remove-part-files"));
    }

    private AtomicFiles() {
    }

    /**
     * Deletes every temporary file of a write still in progress: the body of the shutdown hook, so an
     * interrupted save leaves no {@code .part} file beside its target (the target itself is untouched).
     */
    static void removeUnfinished() {
        for (Path p : UNFINISHED) {
            try {
                Files.deleteIfExists(p);
            } catch (IOException e) {
                // the process is ending: nothing more can be done for this file
            }
            UNFINISHED.remove(p);
        }
    }

    /** Writes {@code content} to {@code target} atomically. */
    public static void write(Path target, Content content) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path folder = absolute.getParent();
        if (folder != null && !Files.isDirectory(folder)) {
            throw new IOException("could not save " + absolute + ": the folder " + folder
                    + " does not exist (create it or choose another folder)");
        }
        Path temporary;
        try {
            temporary = Files.createTempFile(folder, "." + absolute.getFileName() + ".", ".part");
        } catch (IOException e) {
            throw explain(absolute, e);
        }
        UNFINISHED.add(temporary);
        boolean moved = false;
        try {
            keepPermissions(absolute, temporary);
            try (FileChannel channel = FileChannel.open(temporary, StandardOpenOption.WRITE,
                    StandardOpenOption.TRUNCATE_EXISTING);
                 OutputStream out = Channels.newOutputStream(channel)) {
                content.writeTo(out);
                out.flush();
                channel.force(true);
            }
            try {
                Files.move(temporary, absolute, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temporary, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
            moved = true;
        } catch (IOException e) {
            throw explain(absolute, e);
        } finally {
            if (!moved) {
                Files.deleteIfExists(temporary);
            }
            UNFINISHED.remove(temporary);
        }
    }

    /** Writes text (UTF-8) atomically. */
    public static void writeString(Path target, String text) throws IOException {
        write(target, out -> out.write(text.getBytes(StandardCharsets.UTF_8)));
    }

    /**
     * A failed save as a message a user can act on: the file, what went wrong, what to do, and that the
     * previous file (if any) is unchanged. The operating system's own text is kept at the end.
     */
    static IOException explain(Path target, IOException e) {
        String reason = e instanceof FileSystemException f && f.getReason() != null ? f.getReason() : e.getMessage();
        String lower = reason == null ? "" : reason.toLowerCase(Locale.ROOT);
        String advice;
        if (lower.contains("no space left") || lower.contains("not enough space") || lower.contains("disk full")
                || lower.contains("quota")) {
            advice = "the disk is full (free some space or save to another drive)";
        } else if (lower.contains("read-only file system")) {
            advice = "the drive is read-only (choose a folder on a writable drive)";
        } else if (e instanceof AccessDeniedException || lower.contains("permission denied")
                || lower.contains("access is denied")) {
            advice = "permission denied in " + target.getParent() + " (choose a folder you may write to)";
        } else {
            advice = "the file could not be written (check the drive and the folder, then save again)";
        }
        String previous = Files.exists(target) ? "; the previous " + target.getFileName() + " is unchanged" : "";
        return new IOException("could not save " + target + ": " + advice + previous
                + (reason == null ? "" : " [" + reason + "]"), e);
    }

    /**
     * A temporary file is created readable by its owner only; the file it replaces keeps its permissions, and a
     * new file gets the usual rw-r--r-- (where the file system has POSIX permissions).
     */
    private static void keepPermissions(Path target, Path temporary) {
        try {
            java.util.Set<java.nio.file.attribute.PosixFilePermission> permissions = Files.exists(target)
                    ? Files.getPosixFilePermissions(target)
                    : java.nio.file.attribute.PosixFilePermissions.fromString("rw-r--r--");
            Files.setPosixFilePermissions(temporary, permissions);
        } catch (UnsupportedOperationException | IOException e) {
            // not a POSIX file system, or not ours to change: the file system's defaults stay
        }
    }
}
