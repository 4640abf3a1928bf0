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
        return ScenarioFiles.load(TestScenarios.small(dir, "Pipeline test", "maps, report, csv", ""));
    }

    @Test
    void stationWindsGiveTheAnalyticCoastalIndex() throws Exception {
        // 10 m/s northerly (from 0°, blowing southward) along a north-south east coast at 36°N, ocean to the west,
        // drag constant 1.3e-3, rho_a 1.22: tau = 0.1586 Pa equatorward, index 180.50 (CHECKS UI-05, 36°N).
        StringBuilder csv = new StringBuilder("time,speed [m/s],direction [deg]\n");
        for (int d = 1; d <= 5; d++) csv.append(String.format("2021-07-%02dT00:00:00Z,10,0%n", d));
        Files.writeString(dir.resolve("station.csv"), csv.toString());
        Path sf = dir.resolve("station.yaml");
        Files.writeString(sf, """
                study: {name: Station test}
                basin:
                  coordinates: [[-134, 30], [-124, 30], [-124, 42], [-134, 42]]
                winds:
                  source: station
                  file: station.csv
                  station: {name: Buoy, lonDeg: -125, latDeg: 36}
                dragLaw: {name: constant, dragCoefficient: 0.0013}
                gyre: {model: stommel, bottomFriction: 1.0e-5, depth: 1000}
                grid: {spacingDeg: 0.5}
                coast:
                  points: [{name: East Coast 36N, lonDeg: -124, latDeg: 36}]
                  smoothingKm: 50
                outputs: [csv]
                """);
        StudyResult r = new StudyPipeline().run(ScenarioFiles.load(sf), dir.resolve("out"), null, null);
        assertEquals(5.0, r.headlines().get(org.gyreplan.app.scenario.Headline.TIME_STEPS));
        double ui = r.series().get(0).values()[0];
        assertEquals(180.50, ui, 180.50 * 2e-3, "UI-05 at 36°N; tolerance covers the coast-orientation smoothing");
        assertTrue(r.warnings().stream().anyMatch(w -> w.message().contains("station winds")));
    }

    @Test
    void sverdrupModelGivesTheAnalyticInteriorTransportForUniformWesterlies() throws Exception {
        // Uniform eastward stress tau_x on the sphere has curl tau = tau_x tan(phi) / R (spherical curl of a uniform
        // zonal field), so the Sverdrup relation beta V = curl tau / rho0 (Sverdrup 1947; Stewart eq. 11.6) gives
        // V = tau_x sin(phi) / (2 Omega rho0 cos^2 phi) and, integrated westward from the eastern coast,
        // psi(x) = -V (x_E - x). 10 m/s from the west, C_D 1.3e-3, rho_a 1.22: tau_x = 0.1586 Pa (CHECKS UI-05).
        StringBuilder csv = new StringBuilder("time,speed [m/s],direction [deg]\n");
        for (int d = 1; d <= 3; d++) csv.append(String.format("2021-07-%02dT00:00:00Z,10,270%n", d));
        Files.writeString(dir.resolve("westerly.csv"), csv.toString());
        Path sf = dir.resolve("sverdrup.yaml");
        Files.writeString(sf, """
                study: {name: Sverdrup test}
                basin:
                  coordinates: [[-134, 30], [-124, 30], [-124, 42], [-134, 42]]
                winds:
                  source: station
                  file: westerly.csv
                  station: {name: Buoy, lonDeg: -129, latDeg: 36}
                dragLaw: {name: constant, dragCoefficient: 0.0013}
                gyre: {model: sverdrup, depth: 1000}
                grid: {spacingDeg: 0.5}
                coast:
                  points: [{name: East Coast 36N, lonDeg: -124, latDeg: 36}]
                  smoothingKm: 50
                outputs: [csv]
                """);
        StudyResult r = new StudyPipeline().run(ScenarioFiles.load(sf), dir.resolve("out"), null, null);
        org.gyreplan.solver.grid.ScalarField psi = r.field("streamfunction").orElseThrow();
        org.gyreplan.solver.grid.LonLatGrid g = psi.grid();
        int j = (int) Math.round(g.rowOf(36.25));
        double lat = g.latDeg(j);
        double west = Double.NaN, xWest = Double.NaN;
        for (int i = 0; i < g.nx(); i++) {
            if (Double.isFinite(psi.at(i, j))) { west = psi.at(i, j); xWest = g.lonDeg(i); break; }
        }
        double tauX = 1.22 * 1.3e-3 * 10 * 10, omega = 7.292115e-5, rho0 = 1025, radius = 6.371e6;
        double phi = Math.toRadians(lat);
        double v = tauX * Math.sin(phi) / (2 * omega * rho0 * Math.cos(phi) * Math.cos(phi));
        double width = radius * Math.cos(phi) * Math.toRadians(-124 - xWest);
        double expectedSv = -v * width / 1e6;
        // tolerance: one 0.5° cell of the 10° integration path (the coast lies between cell centres)
        assertEquals(expectedSv, west, Math.abs(expectedSv) * 0.06, "Sverdrup psi at the western edge, row " + lat);
        assertTrue(west < 0, "northward interior flow under westerlies gives psi < 0 west of the eastern coast");
    }

    @Test
    void sha256OfAKnownText() throws Exception {
        Path f = dir.resolve("abc.txt");
        Files.writeString(f, "abc");
        // SHA-256 of the three bytes "abc" (FIPS 180-2, appendix B.1 example)
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad", StudyPipeline.sha256(f));
    }

    @Test
    void basinOutsideTheWindDataIsRefusedBeforeWork() throws Exception {
        Path s = TestScenarios.small(dir, "Outside", "report", "").getParent().resolve("study.yaml");
        Files.writeString(s, Files.readString(s).replace("[[-140, 30], [-134, 30], [-134, 36], [-140, 36]]",
                "[[-120, 30], [-110, 30], [-110, 36], [-120, 36]]"));
        StudyException e = assertThrows(StudyException.class,
                () -> new StudyPipeline().run(ScenarioFiles.load(s), dir.resolve("out"), null, null));
        assertTrue(e.getMessage().contains("outside the wind data") && e.getMessage().contains("winds.nc"), e.getMessage());
        assertTrue(e.getMessage().contains(s + ":2"), "names the scenario line of 'basin': " + e.getMessage());
        assertFalse(Files.exists(dir.resolve("out")) && Files.list(dir.resolve("out")).findAny().isPresent());
    }

    @Test
    void cancelWhileStreamingWindsLeavesNoFiles() throws Exception {
        Scenario s = scenario();
        Path out = dir.resolve("out");
        CancelToken cancel = new CancelToken();
        assertThrows(CancelledException.class, () -> new StudyPipeline().run(s, out,
                (stage, f, m) -> { if (stage.equals("winds") && f > 0.5) cancel.cancel(); }, cancel));
        assertFalse(Files.exists(out) && Files.list(out).findAny().isPresent());
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
        assertEquals(StudyPipeline.sha256(TestScenarios.demoWinds()), wind.sha256());
        assertEquals(Files.size(TestScenarios.demoWinds()), wind.bytes());
        assertEquals(10.0, r.headlines().get(org.gyreplan.app.scenario.Headline.TIME_STEPS), "ten daily steps");
        assertEquals(1, r.series().size());
        assertEquals(10, r.series().get(0).values().length);
        try (Stream<Path> left = Files.list(dir)) {
            assertTrue(left.noneMatch(p -> p.getFileName().toString().contains("staging")));
        }
    }
}
