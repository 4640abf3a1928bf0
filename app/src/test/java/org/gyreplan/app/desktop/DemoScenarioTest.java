package org.gyreplan.app.desktop;

import org.gyreplan.app.desktop.study.MapStudy;
import org.gyreplan.app.desktop.study.PipelineStudies;
import org.gyreplan.app.scenario.Scenario;
import org.gyreplan.app.scenario.ScenarioFiles;
import org.gyreplan.gisdata.vector.PolygonFiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The desktop's view of the demo scenario, and saving edits back to a scenario file. */
class DemoScenarioTest {
    static Path demo() {
        for (Path p = Path.of("").toAbsolutePath(); p != null; p = p.getParent()) {
            Path s = p.resolve("scenarios/demo/scenario.yaml");
            if (Files.isRegularFile(s)) return s;
        }
        throw new AssertionError("scenarios/demo/scenario.yaml not found above " + Path.of("").toAbsolutePath());
    }

    @Test
    void previewShowsTheBasinExclusionZonesAndPortOfTheDemo() throws Exception {
        Scenario s = ScenarioFiles.load(demo());
        MapStudy m = PipelineStudies.preview(s);
        // the same polygons as gis-data reads from the scenario's own files (an independent read of the inputs)
        Geometry basin = PolygonFiles.readOne(s.resolve(s.basin.polygon), PolygonFiles.Options.DEFAULT, null);
        assertTrue(basin.equalsExact(m.basin, 0), "basin from basin.geojson");
        assertEquals(PolygonFiles.read(s.resolve(s.exclusionZones)).size(), m.exclusions.size());
        assertNotNull(m.port);
        assertEquals(s.survey.port.lonDeg, m.port.lonDeg(), 0);
        assertEquals(s.survey.port.latDeg, m.port.latDeg(), 0);
        assertTrue(m.title.contains("Merrow"), m.title);
    }

    @Test
    void savingWritesTheDrawnBasinAndNewExclusionZonesBackToTheScenario(@TempDir Path dir) throws Exception {
        Path src = demo().getParent();
        try (Stream<Path> files = Files.list(src)) {
            for (Path f : files.toList()) if (Files.isRegularFile(f)) Files.copy(f, dir.resolve(f.getFileName()));
        }
        Path scen = dir.resolve("scenario.yaml");
        String exclusionBefore = Files.readString(dir.resolve("exclusion.geojson"));
        MapStudy m = PipelineStudies.preview(ScenarioFiles.load(scen));
        GeometryFactory gf = new GeometryFactory();
        Geometry drawn = gf.createPolygon(new Coordinate[] {new Coordinate(-140, 32), new Coordinate(-129, 32),
                new Coordinate(-129, 44), new Coordinate(-140, 44), new Coordinate(-140, 32)});
        m.basin = drawn;
        m.basinEdited = true;
        m.exclusions.add(gf.createPolygon(new Coordinate[] {new Coordinate(-135, 36), new Coordinate(-134, 36),
                new Coordinate(-134, 37), new Coordinate(-135, 36)}));
        m.exclusionsEdited = true;
        DesktopServices.saveEdits(scen, m);

        Scenario back = ScenarioFiles.load(scen);                       // validated again by the scenario module
        assertNull(back.basin.polygon);
        assertEquals(List.of(-140.0, 32.0), back.basin.coordinates.get(0));
        assertEquals(5, back.basin.coordinates.size());
        assertTrue(drawn.equalsExact(PipelineStudies.basin(back), 0), "basin survives the round trip exactly");
        assertEquals("scenario-exclusion-zones.geojson", back.exclusionZones);
        assertEquals(m.exclusions.size(), PolygonFiles.read(back.resolve(back.exclusionZones)).size());
        assertEquals(exclusionBefore, Files.readString(dir.resolve("exclusion.geojson")), "input file untouched");
        assertEquals(ScenarioFiles.load(demo()).winds.file, back.winds.file, "other keys kept");
    }
}
