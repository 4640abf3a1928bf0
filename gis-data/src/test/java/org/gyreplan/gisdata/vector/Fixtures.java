package org.gyreplan.gisdata.vector;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.PrecisionModel;

import java.time.Instant;
import java.util.List;

/** Invented test features (fictional sites), shared by the writer tests. */
final class Fixtures {
    private Fixtures() {}

    static final GeometryFactory GF = new GeometryFactory(new PrecisionModel(), 4326);

    static Coordinate c(double x, double y) { return new Coordinate(x, y); }

    static LinearRing ring(double... xy) {
        Coordinate[] cs = new Coordinate[xy.length / 2];
        for (int k = 0; k < cs.length; k++) cs[k] = c(xy[2 * k], xy[2 * k + 1]);
        return GF.createLinearRing(cs);
    }

    /** Points: two mooring candidates. Extent lon −9.75…12.5, lat −33.5…54.25. */
    static FeatureLayer stations() {
        return new FeatureLayer("stations", List.of(
                Feature.of(GF.createPoint(c(12.5, 54.25)), "name", "M1", "depth_m", 35.5, "rank", 1,
                        "surveyed", true, "time", Instant.parse("2026-03-01T06:00:00Z")),
                Feature.of(GF.createPoint(c(-9.75, -33.5)), "name", "M2 \"south\", deep", "depth_m", 1200.25, "rank", 2,
                        "surveyed", false, "time", Instant.parse("2026-03-02T18:30:00Z"))));
    }

    /** Lines: one transect. Extent lon 10…11.5, lat 54…55. */
    static FeatureLayer transects() {
        return new FeatureLayer("transects", List.of(
                Feature.of(GF.createLineString(new Coordinate[] {c(10, 54), c(11, 54.5), c(11.5, 55)}),
                        "name", "T1", "length_km", 123.4)));
    }

    /** Polygons: a square with a square hole. Extent lon 0…10, lat 40…50; area 100 − 4 = 96 deg². */
    static Polygon squareWithHole() {
        return GF.createPolygon(ring(0, 40, 10, 40, 10, 50, 0, 50, 0, 40),
                new LinearRing[] {ring(4, 44, 4, 46, 6, 46, 6, 44, 4, 44)});
    }

    static FeatureLayer zones() {
        return new FeatureLayer("zones", List.of(
                Feature.of(squareWithHole(), "name", "Zone A", "area_deg2", 96.0),
                Feature.of(GF.createPolygon(ring(20, 30, 22, 30, 22, 31, 20, 31, 20, 30)), "name", "Zone B",
                        "area_deg2", 2.0)));
    }
}
