package org.gyreplan.app.desktop;

import org.gyreplan.app.desktop.study.MapStudy;
import org.gyreplan.app.desktop.study.PipelineStudies;
import org.gyreplan.app.pipeline.StudyPipeline;
import org.gyreplan.app.pipeline.StudyResult;
import org.gyreplan.app.scenario.Scenario;
import org.gyreplan.app.scenario.ScenarioFiles;
import org.gyreplan.gisdata.vector.GeoJsonFiles;
import org.gyreplan.gisdata.vector.PolygonFeature;
import org.gyreplan.gisdata.vector.PolygonFiles;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Connects the desktop to the study pipeline and the scenario files of the {@code app} module: the same service
 * the command line runs.
 */
public final class DesktopServices {
    private DesktopServices() { }

    /** Runs a scenario file with {@link StudyPipeline} and turns the result into what the map shows. */
    public static StudyRunner runner() {
        return (scenario, outDir, progress, cancel) -> {
            Scenario s = ScenarioFiles.load(scenario);
            StudyResult r = new StudyPipeline().run(s, outDir, progress, cancel);
            MapStudy m = PipelineStudies.fromResult(r);
            m.warnings.add(0, "Outputs written to " + r.outputDir());
            return m;
        };
    }

    /** Reads scenario geometry for a preview and writes edits back to the scenario file. */
    public static ScenarioEditing scenarioFiles() {
        return new ScenarioEditing() {
            @Override
            public MapStudy preview(Path file) throws Exception {
                return PipelineStudies.preview(ScenarioFiles.load(file));
            }

            @Override
            public void save(Path file, MapStudy edited) throws Exception {
                saveEdits(file, edited);
            }
        };
    }

    /**
     * Writes the edited basin (inline coordinates, islands from polygon holes) and, when they were edited, the
     * exclusion zones (a new GeoJSON file beside the scenario; the original input file is left untouched) back to
     * the scenario file. Other keys are kept as they were.
     */
    public static void saveEdits(Path file, MapStudy edited) throws Exception {
        Scenario s = ScenarioFiles.load(file);
        if (edited.basinEdited && edited.basin != null) {
            Polygon p = (Polygon) (edited.basin.getNumGeometries() > 1 ? edited.basin.getGeometryN(0) : edited.basin);
            s.basin.polygon = null;
            s.basin.coordinates = PipelineStudies.ring(p);
            List<List<List<Double>>> islands = new ArrayList<>();
            for (int h = 0; h < p.getNumInteriorRing(); h++) {
                List<List<Double>> ring = new ArrayList<>();
                for (var c : p.getInteriorRingN(h).getCoordinates()) ring.add(List.of(c.x, c.y));
                islands.add(ring);
            }
            s.basin.islands = islands.isEmpty() ? null : islands;
        }
        if (edited.exclusionsEdited) {
            String stem = file.getFileName().toString().replaceFirst("\\.ya?ml$", "");
            Path target = file.toAbsolutePath().getParent().resolve(stem + "-exclusion-zones.geojson");
            List<PolygonFeature> fs = new ArrayList<>();
            int k = 0;
            for (Geometry g : edited.exclusions) {
                fs.add(new PolygonFeature(k, "exclusion zone " + (k + 1), g, Map.of(), false));
                k++;
            }
            GeoJsonFiles.write(target, PolygonFiles.toLayer("exclusion zones", fs));
            s.exclusionZones = target.getFileName().toString();
        }
        ScenarioFiles.save(s, file);
    }
}
