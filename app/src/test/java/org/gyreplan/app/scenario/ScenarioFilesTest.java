package org.gyreplan.app.scenario;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

/** Scenario reading, validation messages (file, line, key, allowed values) and save-back. */
class ScenarioFilesTest {
    @TempDir Path dir;

    static final String VALID = """
            study:
              name: Test study
            basin:
              coordinates: [[-20, 30], [-10, 30], [-10, 40], [-20, 40]]
            winds:
              source: gridded
              file: winds.nc
              start: 2021-01-01
              end: 2021-12-31
            dragLaw:
              name: large-pond-1981
            gyre:
              model: stommel
              bottomFriction: 1.0e-6
              depth: 800
            """;

    @BeforeEach
    void files() throws IOException {
        Files.writeString(dir.resolve("winds.nc"), "placeholder bytes; only existence is checked here");
    }

    private Path write(String yaml) throws IOException {
        Path f = dir.resolve("s.yaml");
        Files.writeString(f, yaml);
        return f;
    }

    private ScenarioProblem single(String yaml) throws IOException {
        ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioFiles.load(write(yaml)));
        assertEquals(1, e.problems().size(), e.getMessage());
        ScenarioProblem p = e.problems().get(0);
        assertTrue(e.getMessage().startsWith(dir.resolve("s.yaml").toString() + ":"), e.getMessage());
        return p;
    }

    @Test
    void validScenarioLoadsAndResolvesRelativeFiles() throws Exception {
        Scenario s = ScenarioFiles.load(write(VALID));
        assertEquals("Test study", s.study.name);
        assertEquals(Scenario.GyreModel.STOMMEL, s.gyre.model);
        assertEquals(1.0e-6, s.gyre.bottomFriction);
        assertEquals(dir.resolve("winds.nc").toAbsolutePath(), s.resolve(s.winds.file));
        assertEquals(4, s.basin.coordinates.size());
    }

    @Test
    void unknownKeyNamesLineAndAllowedKeys() throws IOException {
        ScenarioProblem p = single(VALID.replace("  depth: 800", "  depth: 800\n  dpeth: 900"));
        assertEquals(16, p.line());
        assertEquals("gyre.dpeth", p.key());
        assertTrue(p.message().contains("unknown key 'dpeth'"), p.message());
        assertTrue(p.message().contains("bottomFriction") && p.message().contains("lateralViscosity"), p.message());
    }

    @Test
    void unknownTopLevelKey() throws IOException {
        ScenarioProblem p = single("studdy:\n  name: x\n" + VALID);
        assertEquals(1, p.line());
        assertTrue(p.message().contains("at the top level") && p.message().contains("winds"), p.message());
    }

    @Test
    void wrongTypeNamesExpectedType() throws IOException {
        ScenarioProblem p = single(VALID.replace("depth: 800", "depth: deep"));
        assertEquals(15, p.line());
        assertEquals("gyre.depth", p.key());
        assertTrue(p.message().contains("expected a number") && p.message().contains("deep"), p.message());
    }

    @Test
    void unknownEnumValueListsAllowedValues() throws IOException {
        ScenarioProblem p = single(VALID.replace("model: stommel", "model: stomel"));
        assertEquals(13, p.line());
        assertTrue(p.message().contains("allowed values: sverdrup, stommel, munk"), p.message());
    }

    @Test
    void negativeDepthIsRejectedWithItsLine() throws IOException {
        ScenarioProblem p = single(VALID.replace("depth: 800", "depth: -100"));
        assertEquals("gyre.depth", p.key());
        assertEquals(15, p.line());
        assertTrue(p.message().contains("must be > 0") && p.message().contains("-100"), p.message());
    }

    @Test
    void nonPositiveStommelFrictionIsRejected() throws IOException {
        ScenarioProblem p = single(VALID.replace("bottomFriction: 1.0e-6", "bottomFriction: 0"));
        assertEquals("gyre.bottomFriction", p.key());
        assertEquals(14, p.line());
        assertTrue(p.message().contains("must be > 0"), p.message());
    }

    @Test
    void munkNeedsAnExplicitWallCondition() throws IOException {
        ScenarioProblem p = single(VALID.replace("model: stommel\n  bottomFriction: 1.0e-6",
                "model: munk\n  lateralViscosity: 5000"));
        assertEquals("gyre.wall", p.key());
        assertTrue(p.message().contains("no-slip, free-slip"), p.message());
    }

    @Test
    void unknownDragLawListsTheSolversLaws() throws IOException {
        ScenarioProblem p = single(VALID.replace("name: large-pond-1981", "name: large-pond"));
        assertEquals("dragLaw.name", p.key());
        assertEquals(11, p.line());
        assertTrue(p.message().contains("large-pond-1981") && p.message().contains("large-yeager-2004")
                && p.message().contains("constant"), p.message());
    }

    @Test
    void missingWindFileIsNamed() throws IOException {
        ScenarioProblem p = single(VALID.replace("file: winds.nc", "file: nowhere.nc"));
        assertEquals("winds.file", p.key());
        assertEquals(7, p.line());
        assertTrue(p.message().contains("wind file not found") && p.message().contains("nowhere.nc"), p.message());
    }

    @Test
    void badDateAndReversedWindow() throws IOException {
        ScenarioProblem p = single(VALID.replace("end: 2021-12-31", "end: 2020-12-31"));
        assertEquals("winds.end", p.key());
        ScenarioProblem q = single(VALID.replace("start: 2021-01-01", "start: first of May"));
        assertEquals("winds.start", q.key());
        assertTrue(q.message().contains("2021-01-01"), q.message());
    }

    @Test
    void basinNeedsExactlyOneGeometryAndValidPoints() throws IOException {
        ScenarioProblem p = single(VALID.replace("[-20, 40]]", "[-20, 95]]"));
        assertEquals("basin.coordinates[3]", p.key());
        assertEquals(4, p.line());
        assertTrue(p.message().contains("latitude"), p.message());
    }

    @Test
    void everyProblemIsReportedAtOnce() throws IOException {
        ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioFiles.load(write(
                VALID.replace("depth: 800", "depth: -1").replace("bottomFriction: 1.0e-6", "bottomFriction: -2"))));
        assertEquals(2, e.problems().size(), e.getMessage());
    }

    @Test
    void expectedNeedsKnownQuantityAndTolerance() throws IOException {
        ScenarioProblem p = single(VALID + "expected:\n  maxStreamfunctionSv: {value: 10}\n");
        assertEquals("expected.maxStreamfunctionSv.tolerance", p.key());
        ScenarioProblem q = single(VALID + "expected:\n  bestNumber: {value: 10, tolerance: 1}\n");
        assertTrue(q.message().contains("maxStreamfunctionSv"), q.message());
        assertEquals(17, q.line());
    }

    @Test
    void yamlSyntaxErrorHasALine() throws IOException {
        ScenarioProblem p = single(VALID.replace("  name: Test study", "  name: [unclosed"));
        assertTrue(p.line() > 0, p.toString());
        assertTrue(p.message().startsWith("not valid YAML"), p.message());
    }

    @Test
    void duplicateKeyIsRejected() throws IOException {
        ScenarioProblem p = single(VALID.replace("  depth: 800", "  depth: 800\n  depth: 900"));
        assertTrue(p.message().contains("depth"), p.message());
    }

    @Test
    void emptyFileAndMissingFile() throws IOException {
        ScenarioProblem p = single("");
        assertTrue(p.message().contains("empty"), p.message());
        ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioFiles.load(dir.resolve("none.yaml")));
        assertTrue(e.getMessage().contains("not found"));
    }

    @Test
    void saveBackRoundTripsAndRebasesRelativePaths() throws Exception {
        Scenario s = ScenarioFiles.load(write(VALID + "outputs: [netcdf, report]\nexpected:\n  oceanCells: {min: 10, source: count}\n"));
        s.gyre.depth = 750.0;
        Path sub = dir.resolve("elsewhere");
        Files.createDirectories(sub);
        Path saved = sub.resolve("copy.yaml");
        ScenarioFiles.save(s, saved);
        String text = Files.readString(saved);
        assertTrue(text.contains("file: ../winds.nc"), text);
        Scenario back = ScenarioFiles.load(saved);
        assertEquals(750.0, back.gyre.depth);
        assertEquals(s.resolve(s.winds.file), back.resolve(back.winds.file));
        assertEquals(List.of(Scenario.Output.NETCDF, Scenario.Output.REPORT), back.outputs);
        assertEquals(10.0, back.expected.get("oceanCells").min);
        assertEquals(s.basin.coordinates, back.basin.coordinates);
        // saving the re-read scenario again gives identical text (stable output for version control)
        assertEquals(text, ScenarioFiles.toYaml(back, sub));
    }
}
