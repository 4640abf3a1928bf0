package org.gyreplan.app.pipeline;

import org.gyreplan.gisdata.io.AtomicWrite;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;

/**
 * Outputs of one run: every file is first written (atomically) into a hidden staging folder next to the target
 * folder; {@link #commit()} moves them into place, {@link #discard()} deletes them. A cancelled or failed run
 * therefore leaves no partial files in the target folder.
 */
public final class OutputFolder implements AutoCloseable {
    private final Path target;
    private final Path staging;
    private final List<Path> written = new ArrayList<>();
    private boolean committed;

    public OutputFolder(Path target) throws IOException {
        this.target = target.toAbsolutePath().normalize();
        Path parent = this.target.getParent();
        Files.createDirectories(parent);
        this.staging = Files.createTempDirectory(parent, "." + this.target.getFileName() + ".staging-");
    }

    /** The final folder. */
    public Path target() { return target; }

    /** Writes one file through a stream; {@code relative} like {@code "maps/pumping.png"}. */
    public Path write(String relative, AtomicWrite.StreamBody body) throws IOException {
        Path p = staging.resolve(relative);
        AtomicWrite.write(p, body);
        record(relative);
        return p;
    }

    /** Writes one file through a path (for writers that need random access). */
    public Path writeFile(String relative, AtomicWrite.FileBody body) throws IOException {
        Path p = staging.resolve(relative);
        AtomicWrite.toFile(p, body);
        record(relative);
        return p;
    }

    public Path writeString(String relative, String text) throws IOException {
        Path p = staging.resolve(relative);
        AtomicWrite.writeString(p, text);
        record(relative);
        return p;
    }

    private void record(String relative) {
        Path r = Path.of(relative);
        if (!written.contains(r)) written.add(r);
    }

    /** Files written so far, relative to the folder. */
    public List<Path> files() { return List.copyOf(written); }

    /** Where a staged file currently is (for reading back before commit, e.g. to embed images). */
    public Path staged(String relative) { return staging.resolve(relative); }

    /** Moves every staged file into the target folder, replacing files of the same name. */
    public void commit() throws IOException {
        Files.createDirectories(target);
        for (Path rel : written) {
            Path from = staging.resolve(rel), to = target.resolve(rel);
            if (to.getParent() != null) Files.createDirectories(to.getParent());
            try {
                Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
            }
        }
        committed = true;
        deleteTree(staging);
    }

    /** Deletes the staging folder and everything in it. */
    public void discard() throws IOException {
        deleteTree(staging);
    }

    @Override
    public void close() throws IOException {
        if (!committed) discard();
    }

    private static void deleteTree(Path dir) throws IOException {
        if (!Files.exists(dir)) return;
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.sorted(Comparator.reverseOrder()).toList()) Files.deleteIfExists(p);
        }
    }
}
