package org.gyreplan.gisdata.cf;

import org.gyreplan.gisdata.netcdf.NetcdfDataset;
import org.gyreplan.gisdata.netcdf.NetcdfFormatException;
import org.gyreplan.gisdata.netcdf.Variable;
import org.gyreplan.gisdata.units.UnitConversions;
import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.TimeAxis;
import org.gyreplan.solver.grid.VectorField;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.ProgressListener;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.NoSuchElementException;
import java.util.function.Consumer;

/**
 * A gridded time series of one or more variables of a netCDF file (classic or netCDF-4), read one time step at a
 * time on the subset grid of a bounding box. Memory is bounded by the subset (one step of each variable plus one
 * read buffer), not by the file.
 *
 * <pre>{@code
 * try (GriddedSeries s = GriddedSeries.openWind(path, VariableMapping.automatic(), box, from, to)) {
 *     for (GriddedSeries.Step step : s) {
 *         VectorField wind = step.vector();   // m s-1, eastward/northward, on s.grid()
 *     }
 * }
 * }</pre>
 *
 * Values are decoded with {@link CfDecoder} (fill values, packing) and converted to SI (m s⁻¹, Pa, m); the
 * fields carry the CF standard name of their role as name. All variables must share the same longitude,
 * latitude and time dimensions.
 */
public final class GriddedSeries implements AutoCloseable, Iterable<GriddedSeries.Step> {
    private final NetcdfDataset nc;
    private final List<VariableRole> roles;
    private final List<Variable> vars = new ArrayList<>();
    private final List<int[]> axes = new ArrayList<>();
    private final List<CfDecoder> decoders = new ArrayList<>();
    private final HorizontalSubset subset;
    private final int[] timeIndex;      // source time index of each step
    private final List<Instant> times;  // null entries when the file has no time axis
    private final CfTime cfTime;
    private double[] block;

    /** One time step: its index in this series, its time (null if the file has no time axis) and one field per role. */
    public record Step(int index, Instant time, List<VariableRole> roles, List<ScalarField> fields) {
        /** The field of a role. */
        public ScalarField field(VariableRole role) {
            int k = roles.indexOf(role);
            if (k < 0) throw new IllegalArgumentException("this series has no " + role.description());
            return fields.get(k);
        }

        /** The first two fields as a vector (eastward, northward). */
        public VectorField vector() { return new VectorField(fields.get(0), fields.get(1)); }
    }

    private GriddedSeries(NetcdfDataset nc, List<VariableRole> roles, VariableMapping mapping, BoundingBox box,
                          Instant from, Instant to) throws IOException {
        this.nc = nc;
        this.roles = List.copyOf(roles);
        Path file = nc.path();
        for (VariableRole r : roles) {
            VariableFinder.Match m = VariableFinder.require(nc, r, mapping);
            Variable v = m.variable();
            String units = v.textAttribute("units");
            double factor;
            if ((units == null || units.isBlank()) && r.quantity() == UnitConversions.Quantity.LENGTH) {
                factor = 1; // bathymetry files often omit units: metres is common practice
            } else {
                factor = UnitConversions.factorToSI(r.quantity(), units, "variable '" + v.name() + "' in " + file);
            }
            vars.add(v);
            axes.add(CfAxes.require(nc, v));
            decoders.add(new CfDecoder(v, factor));
        }
        int[] a0 = axes.get(0);
        Variable v0 = vars.get(0);
        for (int k = 1; k < vars.size(); k++) {
            int[] ak = axes.get(k);
            Variable vk = vars.get(k);
            for (int d = 0; d < 3; d++) {
                String n0 = a0[d] < 0 ? null : v0.dimensionNames().get(a0[d]);
                String nk = ak[d] < 0 ? null : vk.dimensionNames().get(ak[d]);
                if (n0 == null ? nk != null : !n0.equals(nk)) {
                    throw new NetcdfFormatException(file, "variables '" + v0.name() + "' and '" + vk.name()
                            + "' lie on different axes (" + v0.dimensionNames() + " vs " + vk.dimensionNames() + ")");
                }
            }
        }
        Variable lon = CfAxes.coordinate(nc, v0.dimensionNames().get(a0[0]));
        Variable lat = CfAxes.coordinate(nc, v0.dimensionNames().get(a0[1]));
        subset = HorizontalSubset.of(file, lon.name(), lon.readAll(), lat.name(), lat.readAll(), box,
                PhysicalConstants.DEFAULT.earthRadius());
        // other dimensions must have length 1
        for (int k = 0; k < vars.size(); k++) {
            Variable v = vars.get(k);
            int[] ax = axes.get(k);
            for (int d = 0; d < v.rank(); d++) {
                if (d != ax[0] && d != ax[1] && d != ax[2] && v.shape()[d] != 1) {
                    throw new NetcdfFormatException(file, "variable '" + v.name() + "' has an extra dimension '"
                            + v.dimensionNames().get(d) + "' of length " + v.shape()[d]
                            + "; expected only longitude, latitude, time (and dimensions of length 1)");
                }
            }
        }
        if (a0[2] >= 0) {
            Variable t = CfAxes.coordinate(nc, v0.dimensionNames().get(a0[2]));
            cfTime = CfTime.parse(t.textAttribute("units"), t.textAttribute("calendar"));
            double[] tv = t.readAll();
            List<Instant> sel = new ArrayList<>();
            List<Integer> idx = new ArrayList<>();
            for (int i = 0; i < tv.length; i++) {
                Instant ti = cfTime.toInstant(tv[i]);
                if ((from == null || !ti.isBefore(from)) && (to == null || !ti.isAfter(to))) {
                    sel.add(ti);
                    idx.add(i);
                }
            }
            times = sel;
            timeIndex = idx.stream().mapToInt(Integer::intValue).toArray();
        } else {
            cfTime = null;
            times = new ArrayList<>();
            times.add(null);
            timeIndex = new int[] {-1};
        }
    }

    /** Opens a series of the given roles (e.g. eastward and northward wind) on a box and time window (inclusive; null = open). */
    public static GriddedSeries open(Path path, List<VariableRole> roles, VariableMapping mapping, BoundingBox box,
                                     Instant from, Instant to) throws IOException {
        NetcdfDataset nc = NetcdfDataset.open(path);
        try {
            return new GriddedSeries(nc, roles, mapping, box, from, to);
        } catch (IOException | RuntimeException e) {
            nc.close();
            throw e;
        }
    }

    /** Opens eastward and northward wind. */
    public static GriddedSeries openWind(Path path, VariableMapping mapping, BoundingBox box, Instant from, Instant to)
            throws IOException {
        return open(path, List.of(VariableRole.EASTWARD_WIND, VariableRole.NORTHWARD_WIND), mapping, box, from, to);
    }

    /** Opens eastward and northward surface stress. */
    public static GriddedSeries openStress(Path path, VariableMapping mapping, BoundingBox box, Instant from, Instant to)
            throws IOException {
        return open(path, List.of(VariableRole.EASTWARD_STRESS, VariableRole.NORTHWARD_STRESS), mapping, box, from, to);
    }

    /** The subset grid (latitude ascending, longitudes continuous). */
    public LonLatGrid grid() { return subset.grid(); }
    /** Number of time steps in the window. */
    public int size() { return timeIndex.length; }
    /** Time of step k (null when the file has no time axis). */
    public Instant time(int k) { return times.get(k); }
    /** The times of the window as a {@link TimeAxis} (empty if the file has no time axis). */
    public TimeAxis timeAxis() { return new TimeAxis(cfTime == null ? List.of() : times); }
    /** The CF time decoder, or null. */
    public CfTime cfTime() { return cfTime; }
    /** The file variables used, in role order. */
    public List<Variable> variables() { return List.copyOf(vars); }
    /** The roles, in order. */
    public List<VariableRole> roles() { return roles; }
    /** The underlying file. */
    public NetcdfDataset dataset() { return nc; }

    /** Reads step k (0 ≤ k &lt; size()). */
    public Step read(int k) throws IOException {
        List<ScalarField> fields = new ArrayList<>(vars.size());
        LonLatGrid g = subset.grid();
        for (int r = 0; r < vars.size(); r++) {
            double[] out = new double[g.size()];
            readInto(k, r, out);
            VariableRole role = roles.get(r);
            Variable v = vars.get(r);
            String ln = v.textAttribute("long_name");
            fields.add(new ScalarField(g, out, role.standardName(), role.quantity().siUnit(),
                    role.description() + (ln != null ? " (from " + v.name() + ": " + ln + ")" : " (from " + v.name() + ")")));
        }
        return new Step(k, times.get(k), roles, fields);
    }

    /**
     * Reads role r of step k into {@code out} (length grid().size()) — the allocation-free path for tight loops.
     */
    public void readInto(int k, int r, double[] out) throws IOException {
        Variable v = vars.get(r);
        int[] ax = axes.get(r);
        int[] fixed = new int[v.rank()];
        if (ax[2] >= 0) fixed[ax[2]] = timeIndex[k];
        block = subset.read(v, ax[0], ax[1], fixed, out, block);
        decoders.get(r).decodeInPlace(out, 0, out.length);
    }

    /** Reads every step in order, reporting progress and honouring cancellation. */
    public void forEach(ProgressListener progress, CancelToken cancel, Consumer<Step> action) throws IOException {
        int n = size();
        for (int k = 0; k < n; k++) {
            cancel.check();
            action.accept(read(k));
            progress.progress("read " + nc.path().getFileName(), (k + 1.0) / n, "step " + (k + 1) + " of " + n);
        }
    }

    @Override
    public Iterator<Step> iterator() {
        return new Iterator<>() {
            int k = 0;
            @Override public boolean hasNext() { return k < size(); }
            @Override public Step next() {
                if (!hasNext()) throw new NoSuchElementException();
                try {
                    return read(k++);
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            }
        };
    }

    @Override
    public void close() throws IOException { nc.close(); }
}
