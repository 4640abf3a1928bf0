package org.gyreplan.app.desktop.study;

import org.gyreplan.app.desktop.map.MapPoint;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;
import org.locationtech.jts.geom.Geometry;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Everything the desktop shows of one study: fields (time-varying or not), geometries, points, the plan and
 * messages. Built from a pipeline result (see {@code StudyAdapter}) or, in tests, from small synthetic data.
 * Mutable containers; filled once then handed to the window on the FX thread.
 */
public final class MapStudy {
    /** A named scalar field with one frame per step (or one frame). */
    public record Scalar(String title, List<ScalarField> frames, boolean signed) { }
    /** A named vector field with one frame per step (or one frame). */
    public record Vector(String title, String quantity, List<VectorField> frames) { }
    /** An index point with its charts. */
    public record IndexPoint(String id, String label, double lonDeg, double latDeg, double value, String valueName,
                             String units, PointSeries series, double[] stepValues) {
        public IndexPoint(String id, String label, double lonDeg, double latDeg, double value, String valueName,
                          String units, PointSeries series) {
            this(id, label, lonDeg, latDeg, value, valueName, units, series, null);
        }
    }

    public String title = "Study";
    /** Labels of the time steps (e.g. "1985-03"); empty when nothing varies in time. */
    public final List<String> stepLabels = new ArrayList<>();
    /** Representative instant of each step (for chart markers); empty or parallel to {@link #stepLabels}. */
    public final List<java.time.Instant> stepTimes = new ArrayList<>();
    public final List<Geometry> land = new ArrayList<>();
    /** Sea-floor depth, m, positive downward; may be null. */
    public ScalarField depth;
    public final List<Scalar> scalars = new ArrayList<>();
    public final List<Vector> vectors = new ArrayList<>();
    /** Streamfunction, Sv, for contours; may be null. */
    public ScalarField streamfunction;
    public final List<Geometry> upwellingZones = new ArrayList<>();
    public Geometry basin;
    public final List<Geometry> exclusions = new ArrayList<>();
    /** Whether the basin or the exclusion zones were edited in the app (saved back to the scenario). */
    public boolean basinEdited, exclusionsEdited;
    public final List<IndexPoint> indexPoints = new ArrayList<>();
    public final List<MapPoint> moorings = new ArrayList<>();
    public final List<MapPoint> stations = new ArrayList<>();
    /** Port of the cruise, or null. */
    public MapPoint port;
    /** The editable cruise (route and schedule) whose stop ids match the mooring and station points; or null. */
    public CruisePlan cruise;
    public final List<String> warnings = new ArrayList<>();
    /** Files written by the run (name → path text), for the export menu. */
    public final Map<String, String> outputs = new LinkedHashMap<>();
    /** Map extent {west, east, south, north}, degrees; null = derive from data. */
    public double[] extent;

    /** Number of time steps (at least 1). */
    public int steps() { return Math.max(1, stepLabels.size()); }
}
