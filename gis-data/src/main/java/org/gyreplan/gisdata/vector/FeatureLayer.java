package org.gyreplan.gisdata.vector;

import java.util.List;
import java.util.Objects;

/**
 * A named list of features, written as one layer (GeoPackage table, KML folder, GeoJSON file).
 *
 * @param name     layer name (a GeoPackage table name; letters, digits and '_' are safest)
 * @param features the features (copied; unmodifiable)
 */
public record FeatureLayer(String name, List<Feature> features) {
    public FeatureLayer {
        Objects.requireNonNull(name, "name");
        if (name.isBlank()) throw new IllegalArgumentException("layer name must not be blank");
        features = List.copyOf(features);
    }
}
