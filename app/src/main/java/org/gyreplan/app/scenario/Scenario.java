package org.gyreplan.app.scenario;

import com.fasterxml.jackson.annotation.JsonIgnore;
import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.annotation.JsonPropertyOrder;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * One study, as stated in a scenario file (YAML). This is a plain, mutable data holder so that the desktop app
 * can edit it and {@link ScenarioFiles#save} can write it back; it holds no physics and does no I/O.
 *
 * <p>Units are SI except where a key name carries another unit: {@code ...Deg} (degrees), {@code ...Km}
 * (kilometres), {@code ...Knots}, {@code ...Hours}, {@code ...Days}. Relative file names are resolved against the
 * folder of the scenario file ({@link #baseDir}).
 *
 * <p>Keys of the file, top level:
 * {@code study, basin, grid, winds, dragLaw, constants, gyre, coast, bathymetry, exclusionZones, moorings, survey,
 * outputs, expected}. See {@code scenarios/demo/scenario.yaml} for a commented example.
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
@JsonPropertyOrder({"study", "basin", "grid", "winds", "dragLaw", "constants", "gyre", "coast", "bathymetry",
        "exclusionZones", "moorings", "survey", "outputs", "expected"})
public final class Scenario {

    /** Folder against which relative file names are resolved (the scenario file's folder); not written to YAML. */
    @JsonIgnore public Path baseDir = Path.of(".");
    /** The scenario file this was read from, or null when built in memory; not written to YAML. */
    @JsonIgnore public Path sourceFile;

    public Study study = new Study();
    public Basin basin = new Basin();
    public GridSpec grid = new GridSpec();
    public Winds winds = new Winds();
    public DragLawSpec dragLaw = new DragLawSpec();
    public Constants constants = new Constants();
    public Gyre gyre = new Gyre();
    public Coast coast = new Coast();
    /** Bathymetry file (netCDF or GeoTIFF; depth or elevation, metres); optional. */
    public String bathymetry;
    /** Exclusion zones (polygon file, e.g. GeoJSON) where no mooring or station may go; optional. */
    public String exclusionZones;
    public Moorings moorings;
    public Survey survey;
    /** Products wanted; empty or absent means all. */
    public List<Output> outputs;
    /** Regression checks: quantity name → expected value with tolerance. Optional. */
    public Map<String, Expectation> expected;

    /** Resolves a file name as written in the scenario against {@link #baseDir}. */
    public Path resolve(String fileName) {
        Path p = Path.of(fileName);
        return p.isAbsolute() ? p : baseDir.resolve(p).normalize();
    }

    /** Whether an output kind is wanted (all are when the list is absent or empty). */
    public boolean wants(Output o) {
        return outputs == null || outputs.isEmpty() || outputs.contains(o);
    }

    // ------------------------------------------------------------------------------------------------

    @JsonInclude(JsonInclude.Include.NON_NULL)
    @JsonPropertyOrder({"name", "description", "author"})
    public static final class Study {
        /** Short title of the study; used in the report and in output metadata. */
        public String name;
        public String description;
        public String author;
    }

    /** The basin: an outer coast (polygon) and optional islands, from a file or written inline. */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    @JsonPropertyOrder({"name", "polygon", "coordinates", "islands"})
    public static final class Basin {
        public String name;
        /** Polygon file (GeoJSON, WKT, Shapefile, GeoPackage); the water area is the polygon interior. */
        public String polygon;
        /** Inline outer ring as [lonDeg, latDeg] pairs (closed or not); used when {@link #polygon} is absent. */
        public List<List<Double>> coordinates;
        /** Inline islands (holes), each a ring of [lonDeg, latDeg] pairs. */
        public List<List<List<Double>>> islands;
    }

    /** The computational grid of the study (ocean physics and gyre). */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    @JsonPropertyOrder({"spacingDeg", "westDeg", "eastDeg", "southDeg", "northDeg"})
    public static final class GridSpec {
        /** Cell size, degrees of longitude and latitude (&gt; 0). */
        public Double spacingDeg = 0.25;
        /** Optional bounds (cell edges, degrees); default: the basin's bounding box plus one cell. */
        public Double westDeg;
        public Double eastDeg;
        public Double southDeg;
        public Double northDeg;
    }

    public enum WindSourceKind {
        @JsonProperty("gridded") GRIDDED,
        @JsonProperty("station") STATION,
        @JsonProperty("pressure") PRESSURE
    }

    /** Where the winds come from and which time window is used. */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    @JsonPropertyOrder({"source", "file", "variables", "station", "start", "end"})
    public static final class Winds {
        public WindSourceKind source = WindSourceKind.GRIDDED;
        /** netCDF file (gridded or pressure) or CSV file (station). */
        public String file;
        /** Optional mapping of roles to variable/column names, e.g. {eastward: u10, northward: v10, pressure: slp}. */
        public Map<String, String> variables;
        /** Station position, for station CSV files. */
        public Station station;
        /** First day used (inclusive, ISO date or date-time, UTC); default: start of the data. */
        public String start;
        /** Last day used (inclusive); default: end of the data. */
        public String end;
    }

    @JsonInclude(JsonInclude.Include.NON_NULL)
    @JsonPropertyOrder({"name", "lonDeg", "latDeg"})
    public static final class Station {
        public String name;
        public Double lonDeg;
        public Double latDeg;
    }

    /** The drag law of the bulk formula τ = ρₐ C_D |U| U. */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    @JsonPropertyOrder({"name", "dragCoefficient"})
    public static final class DragLawSpec {
        /** Name of the drag law (see {@code gyreplan verify} and the report for the list). */
        public String name = "large-pond-1981";
        /** C_D for the constant law (dimensionless, e.g. 0.0013). */
        public Double dragCoefficient;
    }

    /** Physical constants; every value is reported. */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    @JsonPropertyOrder({"rho0", "rhoAir", "equatorialCutoffDeg", "omega", "earthRadius"})
    public static final class Constants {
        /** Sea-water reference density ρ₀, kg m⁻³. */
        public Double rho0 = 1025.0;
        /** Air density ρₐ, kg m⁻³. */
        public Double rhoAir = 1.22;
        /** Ekman quantities are undefined within this distance of the equator, degrees. */
        public Double equatorialCutoffDeg = 5.0;
        /** Earth's rotation rate Ω, rad s⁻¹ (optional override). */
        public Double omega;
        /** Earth radius R, m (optional override). */
        public Double earthRadius;
    }

    public enum GyreModel {
        @JsonProperty("sverdrup") SVERDRUP,
        @JsonProperty("stommel") STOMMEL,
        @JsonProperty("munk") MUNK
    }

    public enum Wall {
        @JsonProperty("no-slip") NO_SLIP,
        @JsonProperty("free-slip") FREE_SLIP
    }

    /** The gyre model solved on the mean stress over the basin. */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    @JsonPropertyOrder({"model", "bottomFriction", "lateralViscosity", "wall", "depth", "spacingDeg"})
    public static final class Gyre {
        public GyreModel model = GyreModel.STOMMEL;
        /** Stommel linear bottom-friction rate r, s⁻¹ (&gt; 0). */
        public Double bottomFriction;
        /** Munk lateral eddy viscosity A_H, m² s⁻¹ (&gt; 0). */
        public Double lateralViscosity;
        /** Wall condition for Munk. */
        public Wall wall;
        /** Depth H of the wind-driven layer, m (&gt; 0); used for depth-mean velocities. */
        public Double depth = 1000.0;
        /** Optional separate grid spacing for the gyre solve, degrees (default: the study grid). */
        public Double spacingDeg;
    }

    /** Where along the coast the upwelling index is computed. */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    @JsonPropertyOrder({"spacingKm", "points", "smoothingKm", "bandWidthKm"})
    public static final class Coast {
        /** Distance between index points along the coast, km (used when {@link #points} is absent). */
        public Double spacingKm = 100.0;
        /** Named index points; if given, used instead of automatic spacing. */
        public List<NamedPoint> points;
        /** Length over which the coastline orientation is smoothed, km. */
        public Double smoothingKm = 100.0;
        /** Width of the coastal band for curl-driven upwelling and zones, km. */
        public Double bandWidthKm = 50.0;
    }

    @JsonInclude(JsonInclude.Include.NON_NULL)
    @JsonPropertyOrder({"name", "lonDeg", "latDeg"})
    public static final class NamedPoint {
        public String name;
        public Double lonDeg;
        public Double latDeg;

        public NamedPoint() {}
        public NamedPoint(String name, double lonDeg, double latDeg) {
            this.name = name; this.lonDeg = lonDeg; this.latDeg = latDeg;
        }
    }

    /** Mooring siting: how many, where they may go, and how candidates are weighed. */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    @JsonPropertyOrder({"count", "minDepth", "maxDepth", "minSeparationKm", "maxDistanceFromPortKm", "weights"})
    public static final class Moorings {
        public Integer count = 3;
        /** Shallowest allowed water depth, m. */
        public Double minDepth = 50.0;
        /** Deepest allowed water depth, m. */
        public Double maxDepth = 2000.0;
        public Double minSeparationKm = 30.0;
        public Double maxDistanceFromPortKm;
        /** Relative weights of the ranking criteria: persistence, intensity, variability, portProximity (≥ 0). */
        public Map<String, Double> weights;
    }

    /** Survey cruise: port (its position is the harbour entrance, on water), ship and station pattern. */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    @JsonPropertyOrder({"port", "shipSpeedKnots", "stationSpacingKm", "transectLengthKm", "transectCount",
            "stationTimeHours", "weatherDowntimePercent", "start"})
    public static final class Survey {
        public NamedPoint port;
        public Double shipSpeedKnots = 10.0;
        public Double stationSpacingKm = 20.0;
        public Double transectLengthKm = 100.0;
        public Integer transectCount = 4;
        /** Time on station (CTD cast and overhead), hours. */
        public Double stationTimeHours = 2.0;
        /** Expected share of time lost to weather, percent (0–90). */
        public Double weatherDowntimePercent = 15.0;
        /** Planned departure (ISO date-time, UTC); optional. */
        public String start;
    }

    /** Kinds of output a run can write. */
    public enum Output {
        @JsonProperty("netcdf") NETCDF,
        @JsonProperty("geotiff") GEOTIFF,
        @JsonProperty("csv") CSV,
        @JsonProperty("geojson") GEOJSON,
        @JsonProperty("geopackage") GEOPACKAGE,
        @JsonProperty("gpx") GPX,
        @JsonProperty("kml") KML,
        @JsonProperty("maps") MAPS,
        @JsonProperty("report") REPORT
    }

    /** An expected value of a headline quantity: {@code value ± tolerance}, or a range {@code min … max}. */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    @JsonPropertyOrder({"value", "tolerance", "min", "max", "source"})
    public static final class Expectation {
        public Double value;
        public Double tolerance;
        public Double min;
        public Double max;
        /** Where the expected value comes from (a formula, a second implementation, a published figure). */
        public String source;

        /** Whether {@code got} satisfies this expectation. */
        public boolean accepts(double got) {
            if (!Double.isFinite(got)) return false;
            boolean ok = true;
            if (value != null) ok &= Math.abs(got - value) <= (tolerance == null ? 0.0 : tolerance);
            if (min != null) ok &= got >= min;
            if (max != null) ok &= got <= max;
            return ok;
        }

        private static String g(double v) {
            if (v == Math.rint(v) && Math.abs(v) < 1e9) return Long.toString((long) v);
            String t = String.format(java.util.Locale.ROOT, "%.4g", v);
            return t.contains("e") ? t : t.replaceAll("0+$", "").replaceAll("\\.$", "");
        }

        @Override
        public String toString() {
            List<String> parts = new ArrayList<>();
            if (value != null) parts.add(g(value) + " ± " + g(tolerance == null ? 0.0 : tolerance));
            if (min != null) parts.add("≥ " + g(min));
            if (max != null) parts.add("≤ " + g(max));
            return String.join(", ", parts);
        }
    }

    /** A copy of the expected block, never null. */
    public Map<String, Expectation> expectedOrEmpty() {
        return expected == null ? Map.of() : new LinkedHashMap<>(expected);
    }
}
