package org.gyreplan.gisdata.io;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/**
 * Writes a file atomically: the content goes to a temporary file in the target's folder, which is moved over
 * the target only when the writer finished without error. A failed or cancelled write leaves no partial file
 * and keeps any previous version of the target intact.
 */
public final class AtomicWrite {
    private AtomicWrite() {}

    /** Body of a write: fills the given stream. */
    @FunctionalInterface
    public interface StreamBody {
        void write(OutputStream out) throws IOException;
    }

    /** Body of a write that needs a file path (e.g. SQLite or random-access writers). */
    @FunctionalInterface
    public interface FileBody {
        void write(Path temporary) throws IOException;
    }

    /** Writes through an output stream, then moves into place. */
    public static void write(Path target, StreamBody body) throws IOException {
        toFile(target, tmp -> {
            try (OutputStream out = new java.io.BufferedOutputStream(Files.newOutputStream(tmp), 1 << 16)) {
                body.write(out);
            }
        });
    }

    /** Writes a UTF-8 text file atomically. */
    public static void writeString(Path target, String text) throws IOException {
        write(target, out -> out.write(text.getBytes(java.nio.charset.StandardCharsets.UTF_8)));
    }

    /** Lets the body write a temporary file by path, then moves it into place. */
    public static void toFile(Path target, FileBody body) throws IOException {
        Path abs = target.toAbsolutePath();
        Path dir = abs.getParent();
        if (dir != null) Files.createDirectories(dir);
        Path tmp = Files.createTempFile(dir, "." + abs.getFileName() + ".", ".part");
        boolean done = false;
        try {
            Files.deleteIfExists(tmp);
            body.write(tmp);
            try {
                Files.move(tmp, abs, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING);
            }
            done = true;
        } finally {
            if (!done) Files.deleteIfExists(tmp);
        }
    }
}
