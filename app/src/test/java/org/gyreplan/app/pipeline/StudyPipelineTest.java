package org.gyreplan.app.pipeline;

import org.gyreplan.app.scenario.Scenario;
import org.gyreplan.app.scenario.ScenarioFiles;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.CancelledException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.*;

/** Pipeline service contract: staged outputs, cancel leaves nothing behind, provenance checksums. */
class StudyPipelineTest {
    @TempDir Path dir;

    Scenario scenario() throws Exception {
        Files.writeString(dir.resolve("winds.nc"), "abc");
        Path s = dir.resolve("s.yaml");
        Files.writeString(s, """
                study: {name: Pipeline test}
                basin:
                  coordinates: [[-20, 30], [-16, 30], [-16, 33], [-20, 33]]
                winds: {source: gridded, file: winds.nc}
                dragLaw: {name: large-pond-1981}
                gyre: {model: stommel, bottomFriction: 1.0e-6, depth: 1000}
                grid: {spacingDeg: 0.5}
                """);
        return ScenarioFiles.load(s);
    }

    @Test
    void cancelDuringOutputsLeavesNoFiles() throws Exception {
        Scenario s = scenario();
        Path out = dir.resolve("out");
        CancelToken cancel = new CancelToken();
        assertThrows(CancelledException.class, () -> new StudyPipeline().run(s, out,
                (stage, f, m) -> { if (stage.equals("outputs") && f > 0.3) cancel.cancel(); }, cancel));
        assertFalse(Files.exists(out) && Files.list(out).findAny().isPresent(), "no outputs may remain after cancel");
        try (Stream<Path> left = Files.list(dir)) {
            List<String> names = left.map(p -> p.getFileName().toString()).toList();
            assertTrue(names.stream().noneMatch(n -> n.contains("staging")), "staging folder removed: " + names);
        }
    }

    @Test
    void completedRunCommitsFilesAndRecordsChecksums() throws Exception {
        Scenario s = scenario();
        Path out = dir.resolve("out");
        StudyResult r = new StudyPipeline().run(s, out, null, null);
        assertTrue(r.report().isPresent());
        for (Path p : r.outputFiles()) assertTrue(Files.isRegularFile(out.resolve(p)), p.toString());
        Provenance.InputFile wind = r.provenance().inputs().stream().filter(f -> f.role().startsWith("winds")).findFirst().orElseThrow();
        // SHA-256 of the three bytes "abc" (FIPS 180-2, appendix B.1 example)
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad", wind.sha256());
        assertEquals(3, wind.bytes());
        try (Stream<Path> left = Files.list(dir)) {
            assertTrue(left.noneMatch(p -> p.getFileName().toString().contains("staging")));
        }
    }
}
