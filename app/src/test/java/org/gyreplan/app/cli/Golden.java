package org.gyreplan.app.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.fail;

/**
 * Golden-output comparison: the expected text lives in {@code src/test/resources/golden/<name>.txt}. Run the
 * tests with {@code -Dgolden.update=true} to rewrite the files after an intended change (then review the diff).
 */
final class Golden {
    private Golden() {}

    static final Path DIR = Path.of("src/test/resources/golden");

    static void check(String name, String actual) throws IOException {
        Path f = DIR.resolve(name + ".txt");
        String got = actual.replace("\r\n", "\n");
        if (Boolean.getBoolean("golden.update")) {
            Files.createDirectories(DIR);
            Files.writeString(f, got, StandardCharsets.UTF_8);
            return;
        }
        if (!Files.exists(f)) fail("golden file " + f.toAbsolutePath() + " is missing; run with -Dgolden.update=true and review it");
        assertEquals(Files.readString(f, StandardCharsets.UTF_8), got, "output differs from golden file " + f);
    }
}
