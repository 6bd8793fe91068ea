package org.eddycast.scenario;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.FileChannel;
import java.nio.file.AccessDeniedException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;

/**
 * Writes a file so that a reader sees either the old content or the whole new one, never a part: the bytes go
 * to a temporary file in the same folder, are forced to disk, and the temporary file is then moved over the
 * target. If anything fails, the old file is left as it was and the temporary file is removed.
 */
public final class AtomicFiles {

    /** Writes the content of a file. */
    @FunctionalInterface
    public interface Content {
        void writeTo(OutputStream out) throws IOException;
    }

    private AtomicFiles() {
    }

    /** Writes {@code content} to {@code target} atomically. */
    public static void write(Path target, Content content) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path folder = absolute.getParent();
        if (folder != null && !Files.isDirectory(folder)) {
            throw new IOException("the folder " + folder + " does not exist");
        }
        Path temporary;
        try {
            temporary = Files.createTempFile(folder, "." + absolute.getFileName() + ".", ".part");
        } catch (AccessDeniedException e) {
            throw new IOException("cannot write in " + folder + ": permission denied (choose another folder)", e);
        }
        boolean moved = false;
        try {
            try (FileChannel channel = FileChannel.open(temporary, StandardOpenOption.WRITE,
                    StandardOpenOption.TRUNCATE_EXISTING);
                 OutputStream out = java.nio.channels.Channels.newOutputStream(channel)) {
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
        } finally {
            if (!moved) {
                Files.deleteIfExists(temporary);
            }
        }
    }

    /** Writes text (UTF-8) atomically. */
    public static void writeString(Path target, String text) throws IOException {
        write(target, out -> out.write(text.getBytes(java.nio.charset.StandardCharsets.UTF_8)));
    }
}
