package org.gyreplan.gisdata.io;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.*;

class AtomicWriteTest {
    @TempDir Path dir;

    @Test
    void failedWriteLeavesPreviousContentAndNoTemporaryFile() throws IOException {
        Path target = dir.resolve("a.csv");
        AtomicWrite.writeString(target, "old");
        assertThrows(IOException.class, () -> AtomicWrite.write(target, out -> {
            out.write("partial".getBytes());
            throw new IOException("disk full");
        }));
        assertEquals("old", Files.readString(target));
        try (var s = Files.list(dir)) {
            assertEquals(1, s.count(), "no temporary file may remain");
        }
    }
}
