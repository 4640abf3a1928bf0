package org.gyreplan.gisdata.vector;

import org.locationtech.jts.geom.Coordinate;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;

/**
 * A polygon or vector file that cannot be used, with a {@link Problem} key, the file, the feature (index and name,
 * when known) and the location of the problem (longitude/latitude in degrees, when known). The message reads
 * e.g. {@code basin.geojson: feature 2 ("North Bay"): self-intersection at lon 10.500000, lat 54.200000}.
 */
public final class GeometryFileException extends IOException {
    private static final long serialVersionUID = 1L;

    /** What went wrong. */
    public enum Problem {
        /** The file could not be parsed (syntax, truncated, wrong magic number). */
        UNREADABLE,
        /** The file extension or container is not a supported polygon format. */
        UNSUPPORTED_FORMAT,
        /** A geometry is not a Polygon or MultiPolygon. */
        NOT_POLYGON,
        /** A ring's first and last points differ. */
        RING_NOT_CLOSED,
        /** A ring has fewer than 4 points (closing point included). */
        TOO_FEW_POINTS,
        /** The geometry is not valid in the OGC Simple Features sense (self-intersection, crossing holes, ...). */
        INVALID_GEOMETRY,
        /** The coordinate reference is projected, not geographic longitude/latitude. */
        PROJECTED_CRS,
        /** The coordinate reference is geographic but not WGS 84, or could not be recognised. */
        UNSUPPORTED_CRS,
        /** A coordinate is outside the geographic range or not finite. */
        COORDINATE_OUT_OF_RANGE,
        /** The file holds no polygon (layer), or the requested layer does not exist, or several qualify. */
        NO_POLYGONS
    }

    private final Problem problem;
    private final transient Path file;
    private final int featureIndex;
    private final String featureName;
    private final Coordinate location;

    /**
     * @param problem      the problem key
     * @param file         the file (may be {@code null} for inline input)
     * @param featureIndex zero-based feature index, or −1 when not about one feature
     * @param featureName  the feature's name, or {@code null}
     * @param location     where (x = lon, y = lat, degrees), or {@code null}
     * @param detail       what was found and what was expected
     */
    public GeometryFileException(Problem problem, Path file, int featureIndex, String featureName,
                                 Coordinate location, String detail) {
        super(compose(file, featureIndex, featureName, location, detail));
        this.problem = problem;
        this.file = file;
        this.featureIndex = featureIndex;
        this.featureName = featureName;
        this.location = location == null ? null : new Coordinate(location);
    }

    private static String compose(Path file, int featureIndex, String featureName, Coordinate location, String detail) {
        StringBuilder b = new StringBuilder();
        b.append(file == null ? "inline polygon" : String.valueOf(file.getFileName()));
        if (featureIndex >= 0) {
            b.append(": feature ").append(featureIndex);
            if (featureName != null) b.append(" (\"").append(featureName).append("\")");
        }
        b.append(": ").append(detail);
        if (location != null) {
            b.append(String.format(Locale.ROOT, " at lon %.6f, lat %.6f", location.x, location.y));
        }
        return b.toString();
    }

    /** The problem key. */
    public Problem problem() { return problem; }
    /** The file, or {@code null} for inline input. */
    public Path file() { return file; }
    /** Zero-based feature index, or −1. */
    public int featureIndex() { return featureIndex; }
    /** Feature name, or {@code null}. */
    public String featureName() { return featureName; }
    /** Location of the problem (x = lon, y = lat, degrees), or {@code null}. */
    public Coordinate location() { return location == null ? null : new Coordinate(location); }
}
