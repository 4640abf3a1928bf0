package org.gyreplan.gisdata.vector;

import org.locationtech.jts.geom.Geometry;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * A polygon read from a file: a valid {@code Polygon} or {@code MultiPolygon} in geographic WGS 84
 * (x = longitude, y = latitude, degrees, as in the file), its name and its attributes.
 *
 * @param index      zero-based position of the feature in the file (or layer)
 * @param name       the value of the first attribute called name/NAME/Name/title/id, else {@code "feature <index>"}
 * @param polygon    the Polygon or MultiPolygon
 * @param attributes all attributes of the feature (including the one used as name), in file order (unmodifiable)
 * @param repaired   whether the geometry was changed by the opt-in repair
 */
public record PolygonFeature(int index, String name, Geometry polygon, Map<String, Object> attributes, boolean repaired) {
    public PolygonFeature {
        attributes = Collections.unmodifiableMap(new LinkedHashMap<>(attributes));
    }

    /** This polygon as a writer {@link Feature} with a "name" property followed by the attributes. */
    public Feature toFeature() {
        LinkedHashMap<String, Object> p = new LinkedHashMap<>();
        p.put("name", name);
        attributes.forEach(p::putIfAbsent);
        return new Feature(polygon, p);
    }
}
