package org.gyreplan.app.desktop.study;

import javafx.scene.paint.Color;
import org.gyreplan.app.desktop.map.BathymetryLayer;
import org.gyreplan.app.desktop.map.ColourScale;
import org.gyreplan.app.desktop.map.ContourLayer;
import org.gyreplan.app.desktop.map.MapLayer;
import org.gyreplan.app.desktop.map.MapPoint;
import org.gyreplan.app.desktop.map.PointLayer;
import org.gyreplan.app.desktop.map.PolygonLayer;
import org.gyreplan.app.desktop.map.ScalarFieldLayer;
import org.gyreplan.app.desktop.map.TrackLayer;
import org.gyreplan.app.desktop.map.VectorLayer;
import org.locationtech.jts.geom.Geometry;

import java.util.ArrayList;
import java.util.List;

/** Builds the map layers of a {@link MapStudy}, bottom to top, with our styles. */
public final class StudyLayers {
    /** Layer titles (also used by tests and the layer panel). */
    public static final String LAND = "Land", DEPTH = "Bathymetry", PSI = "Streamfunction contours",
            ZONES = "Upwelling zones", BASIN = "Basin outline", EXCLUSIONS = "Exclusion zones",
            ROUTE = "Survey stations", TRACK = "Cruise track", PORT = "Port", MOORINGS = "Mooring sites", INDEX = "Index points";

    /** The built layers and handles to the editable ones. */
    public record Built(List<MapLayer> layers, PolygonLayer basin, PolygonLayer exclusions,
                        PointLayer moorings, PointLayer stations, PointLayer indexPoints) { }

    private StudyLayers() { }

    public static Built build(MapStudy s) {
        List<MapLayer> out = new ArrayList<>();
        if (s.depth != null) out.add(new BathymetryLayer(DEPTH, s.depth));
        boolean first = true;
        for (MapStudy.Scalar sc : s.scalars) {
            ScalarFieldLayer l = new ScalarFieldLayer(sc.title(), sc.frames(), sc.signed(), 0.85);
            l.setVisible(first);
            first = false;
            out.add(l);
        }
        PolygonLayer land = new PolygonLayer(LAND, "Land", Color.rgb(224, 218, 203), Color.rgb(120, 110, 95), 0.8, null);
        for (Geometry g : s.land) land.add(g, null);
        out.add(land);
        if (s.streamfunction != null) {
            out.add(ContourLayer.auto(PSI + " (Sv)", List.of(s.streamfunction), 10, Color.rgb(35, 35, 60)));
        }
        PolygonLayer zones = new PolygonLayer(ZONES, "Upwelling zone", Color.rgb(20, 160, 140, 0.22),
                Color.rgb(10, 120, 105), 1.6, null);
        int z = 1;
        for (Geometry g : s.upwellingZones) zones.add(g, "Z" + z++);
        out.add(zones);
        boolean firstVector = true;
        for (MapStudy.Vector v : s.vectors) {
            VectorLayer vl = new VectorLayer(v.title(), v.quantity(), v.frames(), Color.rgb(30, 30, 30, 0.85));
            vl.setVisible(firstVector);                      // one arrow field at a time keeps the map legible
            firstVector = false;
            out.add(vl);
        }
        PolygonLayer basin = new PolygonLayer(BASIN, "Basin", null, Color.rgb(20, 60, 160), 2.0, null);
        if (s.basin != null) basin.add(s.basin, null);
        out.add(basin);
        PolygonLayer excl = new PolygonLayer(EXCLUSIONS, "Exclusion zone", Color.rgb(200, 40, 40, 0.16),
                Color.rgb(190, 30, 30), 1.4, new double[] {6, 3});
        for (Geometry g : s.exclusions) excl.add(g, null);
        out.add(excl);
        out.add(new TrackLayer(TRACK, () -> s.cruise == null ? List.of() : s.cruise.tracks(), Color.rgb(200, 110, 10)));
        PointLayer stations = new PointLayer(ROUTE, s.stations, PointLayer.Marker.TRIANGLE, Color.rgb(235, 140, 20),
                null, null, null, s.cruise == null, true, true);
        out.add(stations);
        if (s.port != null) {
            out.add(new PointLayer(PORT, List.of(s.port), PointLayer.Marker.SQUARE, Color.rgb(60, 60, 60),
                    null, null, null, false, false, true));
        }
        PointLayer moorings = new PointLayer(MOORINGS, s.moorings, PointLayer.Marker.DIAMOND, Color.rgb(150, 40, 170),
                null, null, null, false, true, true);
        out.add(moorings);
        List<MapPoint> idx = new ArrayList<>();
        double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY;
        String name = "Index", units = "";
        for (MapStudy.IndexPoint p : s.indexPoints) {
            MapPoint mp = new MapPoint(p.id(), p.label(), p.lonDeg(), p.latDeg(), p.value());
            mp.setStepValues(p.stepValues());
            idx.add(mp);
            if (Double.isFinite(p.value())) { lo = Math.min(lo, p.value()); hi = Math.max(hi, p.value()); }
            if (p.stepValues() != null) for (double v : p.stepValues()) if (Double.isFinite(v)) { lo = Math.min(lo, v); hi = Math.max(hi, v); }
            name = p.valueName();
            units = p.units();
        }
        ColourScale idxScale = new ColourScale(ColourScale.Kind.DIVERGING, lo, hi, 1.0);
        PointLayer index = new PointLayer(INDEX, idx, PointLayer.Marker.CIRCLE, Color.rgb(60, 60, 60), idxScale,
                name, units, false, false, false);
        index.setVisible(!idx.isEmpty());
        out.add(index);
        return new Built(out, basin, excl, moorings, stations, index);
    }
}
