package org.gyreplan.app.pipeline;

import org.gyreplan.gisdata.cf.BoundingBox;
import org.gyreplan.gisdata.cf.GriddedSeries;
import org.gyreplan.gisdata.cf.VariableMapping;
import org.gyreplan.gisdata.cf.VariableRole;
import org.gyreplan.gisdata.csv.StationWindCsv;
import org.gyreplan.gisdata.csv.StationWindSeries;
import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.atmos.GeostrophicWind;
import org.gyreplan.solver.atmos.SurfaceWindFromGeostrophic;
import org.gyreplan.solver.ekman.EquatorialCutoff;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/** The 10 m wind of each time step on one grid, whatever the source (gridded winds, pressure, station). */
interface WindSteps extends AutoCloseable {
    /** The grid the winds are given on (no basin mask). */
    LonLatGrid grid();
    int size();
    Instant time(int k);
    /** The wind of step k on the masked grid {@code g} (same geometry as {@link #grid()}), m s⁻¹, NaN on land. */
    VectorField wind(int k, LonLatGrid g) throws IOException;
    /** A line for the provenance table. */
    String describe();
    @Override void close() throws IOException;

    static ScalarField on(LonLatGrid masked, ScalarField f) {
        double[] v = f.values().clone();
        for (int k = 0; k < v.length; k++) if (!masked.isOcean(k)) v[k] = Double.NaN;
        return new ScalarField(masked, v, f.name(), f.units(), f.longName());
    }

    /** Gridded 10 m winds, or sea-level pressure turned into surface winds. */
    static WindSteps gridded(Path file, VariableMapping mapping, BoundingBox box, Instant from, Instant to, boolean pressure,
                             PhysicalConstants constants, EquatorialCutoff cutoff) throws IOException {
        GriddedSeries s = pressure
                ? GriddedSeries.open(file, List.of(VariableRole.SEA_LEVEL_PRESSURE), mapping, box, from, to)
                : GriddedSeries.openWind(file, mapping, box, from, to);
        return new WindSteps() {
            public LonLatGrid grid() { return s.grid(); }
            public int size() { return s.size(); }
            public Instant time(int k) { Instant t = s.time(k); return t != null ? t : Instant.EPOCH.plusSeconds(86400L * k); }
            public VectorField wind(int k, LonLatGrid g) throws IOException {
                GriddedSeries.Step step = s.read(k);
                if (pressure) {
                    VectorField geo = GeostrophicWind.field(on(g, step.fields().get(0)), constants, cutoff).wind();
                    return SurfaceWindFromGeostrophic.DEFAULT.apply(geo);
                }
                return new VectorField(on(g, step.fields().get(0)), on(g, step.fields().get(1)));
            }
            public String describe() {
                return String.join(", ", s.variables().stream().map(v -> v.name()).toList())
                        + (pressure ? "; surface wind = geostrophic × " + SurfaceWindFromGeostrophic.DEFAULT.reductionFactor()
                        + ", turned " + SurfaceWindFromGeostrophic.DEFAULT.turningAngleDeg() + "° toward low pressure" : "");
            }
            public void close() throws IOException { s.close(); }
        };
    }

    /**
     * Winds of one station applied uniformly over the study grid (the stress curl is then zero; only the β term
     * of the pumping and the coastal index remain). Steps with a missing value are skipped.
     */
    static WindSteps station(Path file, LonLatGrid grid, Instant from, Instant to) throws IOException {
        StationWindSeries w = StationWindCsv.read(file);
        List<Integer> keep = new ArrayList<>();
        for (int k = 0; k < w.size(); k++) {
            Instant t = w.time(k);
            if (from != null && t.isBefore(from)) continue;
            if (to != null && t.isAfter(to)) continue;
            if (!Double.isFinite(w.eastwardMs(k)) || !Double.isFinite(w.northwardMs(k))) continue;
            keep.add(k);
        }
        return new WindSteps() {
            public LonLatGrid grid() { return grid; }
            public int size() { return keep.size(); }
            public Instant time(int k) { return w.time(keep.get(k)); }
            public VectorField wind(int k, LonLatGrid g) {
                int n = keep.get(k);
                double[] u = new double[g.size()], v = new double[g.size()];
                Arrays.fill(u, w.eastwardMs(n));
                Arrays.fill(v, w.northwardMs(n));
                return new VectorField(on(g, new ScalarField(g, u, "eastward_wind", "m s-1", "station eastward wind")),
                        on(g, new ScalarField(g, v, "northward_wind", "m s-1", "station northward wind")));
            }
            public String describe() {
                return "station series " + file.getFileName() + " (" + keep.size() + " of " + w.size()
                        + " records used), applied uniformly over the basin";
            }
            public void close() { }
        };
    }
}
