package org.gyreplan.gisdata.vector;

import org.locationtech.jts.geom.Geometry;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;

/**
 * A simple feature: a JTS geometry in geographic WGS 84 (x = longitude, y = latitude, degrees; longitudes may be
 * continuous beyond ±180°, writers bring them into range) and ordered properties. Property values may be
 * {@link String}, {@link Number} (integers are written as integers), {@link Boolean}, {@link java.time.Instant}
 * (written as ISO 8601 UTC text) or {@code null}.
 *
 * @param geometry   the geometry (Point, LineString, Polygon or their Multi- forms)
 * @param properties attribute name → value, in column order (copied; unmodifiable)
 */
public record Feature(Geometry geometry, Map<String, Object> properties) {
    public Feature {
        Objects.requireNonNull(geometry, "geometry");
        properties = Collections.unmodifiableMap(new LinkedHashMap<>(properties == null ? Map.of() : properties));
    }

    /** A feature with properties given as alternating name, value pairs. */
    public static Feature of(Geometry geometry, Object... nameValuePairs) {
        if (nameValuePairs.length % 2 != 0) throw new IllegalArgumentException("properties must come as name, value pairs");
        LinkedHashMap<String, Object> m = new LinkedHashMap<>();
        for (int k = 0; k < nameValuePairs.length; k += 2) m.put(String.valueOf(nameValuePairs[k]), nameValuePairs[k + 1]);
        return new Feature(geometry, m);
    }

    /** The value of a property, or {@code null}. */
    public Object get(String name) { return properties.get(name); }
}
