package org.gyreplan.app.pipeline;

import org.gyreplan.app.scenario.Headline;
import org.gyreplan.app.scenario.Scenario;
import org.gyreplan.app.scenario.ScenarioValidator;
import org.gyreplan.gisdata.cf.BoundingBox;
import org.gyreplan.gisdata.cf.GriddedSeries;
import org.gyreplan.gisdata.cf.VariableMapping;
import org.gyreplan.gisdata.cf.VariableRole;
import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.atmos.GeostrophicWind;
import org.gyreplan.solver.atmos.SurfaceWindFromGeostrophic;
import org.gyreplan.solver.coast.CoastPoint;
import org.gyreplan.solver.coast.Coastline;
import org.gyreplan.solver.ekman.EquatorialCutoff;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;
import org.gyreplan.solver.gyre.Geometry;
import org.gyreplan.solver.gyre.GyreException;
import org.gyreplan.solver.gyre.GyreProblem;
import org.gyreplan.solver.gyre.GyreSolution;
import org.gyreplan.solver.gyre.GyreSolver;
import org.gyreplan.solver.gyre.Sverdrup;
import org.gyreplan.solver.gyre.WallCondition;
import org.gyreplan.solver.plan.zones.UpwellingStatistics;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.CancelledException;
import org.gyreplan.solver.progress.ProgressListener;
import org.gyreplan.solver.series.Aggregation;
import org.gyreplan.solver.series.Coverage;
import org.gyreplan.solver.series.MonthlyClimatology;
import org.gyreplan.solver.series.TimeSeries;
import org.gyreplan.solver.series.UpwellingSeason;
import org.gyreplan.solver.stress.DragLaw;
import org.gyreplan.solver.stress.DragLaws;
import org.gyreplan.solver.surface.SurfaceResponse;
import org.gyreplan.solver.upwelling.CoastalUpwellingIndex;
import org.gyreplan.solver.upwelling.PointIndex;
import org.locationtech.jts.geom.Envelope;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The main job: runs one scenario from its inputs to its outputs. No GUI types; the desktop app calls
 * {@link #run} off its UI thread and forwards progress, the CLI draws a progress bar.
 *
 * <pre>
 *   StudyResult r = new StudyPipeline().run(scenario, Path.of("out"), listener, cancelToken);
 * </pre>
 *
 * <p>Stages (each reports progress under its name, see {@link #STAGES}): inputs (checksums) → basin (polygon,
 * coast points) → winds (streamed per time step, memory O(grid): wind → stress → Ekman transport and pumping →
 * running means, upwelling statistics and the coastal index at each point) → gyre (on the mean stress, basin
 * mask) → coast (daily and monthly series, climatology, seasons) → planning → outputs. Outputs are staged in a
 * hidden folder and moved into {@code outDir} only when the run completes; on cancel or failure nothing is left
 * behind. The physics lives in the solver; this class only connects the pieces.
 */
public final class StudyPipeline {

    /** Stage names, in order, as reported to the {@link ProgressListener}. */
    public static final List<String> STAGES = List.of("inputs", "basin", "winds", "gyre", "coast", "planning", "outputs");

    /**
     * Runs a scenario.
     *
     * @param scenario a validated scenario (see {@code ScenarioFiles.load})
     * @param outDir   folder for the outputs (created; existing files of the same names are replaced)
     * @param progress receives stage, fraction and message (may be null)
     * @param cancel   polled between time steps and stages; when cancelled the run throws
     *                 {@link CancelledException} and leaves no partial files (may be null)
     * @throws StudyException when an input cannot be used (message names the file and what was expected)
     */
    public StudyResult run(Scenario scenario, Path outDir, ProgressListener progress, CancelToken cancel)
            throws StudyException, IOException {
        Instant started = Instant.now();
        RunState st = new RunState(scenario, progress == null ? ProgressListener.NONE : progress,
                cancel == null ? CancelToken.none() : cancel);
        try (OutputFolder out = new OutputFolder(outDir)) {
            st.out = out;
            inputs(st);
            basin(st);
            winds(st);
            gyre(st);
            coast(st);
            new Planning(st).run();
            st.cancel.check();
            new Products(st).write(started);
            st.cancel.check();
            out.commit();
            st.progress.progress("outputs", 1.0, "wrote " + out.files().size() + " files to " + out.target());
            return st.result(out.target(), out.files(), provenance(st, started));
        }
    }

    // ------------------------------------------------------------------------------------------- stages

    private void inputs(RunState st) throws StudyException, IOException {
        Scenario s = st.scenario;
        List<String[]> files = new ArrayList<>();
        if (s.basin.polygon != null) files.add(new String[] {"basin polygon", s.basin.polygon});
        if (s.winds.file != null) files.add(new String[] {"winds (" + s.winds.source.name().toLowerCase(Locale.ROOT) + ")", s.winds.file});
        if (s.bathymetry != null) files.add(new String[] {"bathymetry", s.bathymetry});
        if (s.exclusionZones != null) files.add(new String[] {"exclusion zones", s.exclusionZones});
        if (s.sourceFile != null && Files.isRegularFile(s.sourceFile)) files.add(0, new String[] {"scenario", s.sourceFile.toAbsolutePath().toString()});
        for (int k = 0; k < files.size(); k++) {
            st.cancel.check();
            Path p = s.resolve(files.get(k)[1]);
            if (!Files.isRegularFile(p)) throw new StudyException(p, files.get(k)[0], "file not found");
            st.progress.progress("inputs", (double) k / files.size(), "checksum " + p.getFileName());
            st.inputs.add(new Provenance.InputFile(files.get(k)[0], p.toString(), Files.size(p), sha256(p)));
        }
        st.progress.progress("inputs", 1.0, files.size() + " input files");
    }

    private void basin(RunState st) throws StudyException {
        Scenario s = st.scenario;
        st.progress.progress("basin", 0.0, "basin polygon");
        st.constants = constants(s);
        st.cutoff = EquatorialCutoff.ofDegrees(s.constants.equatorialCutoffDeg == null ? 5.0 : s.constants.equatorialCutoffDeg);
        st.basin = BasinGeometry.of(s);
        Envelope e = st.basin.envelope();
        double d = s.grid.spacingDeg;
        double[] box = s.grid.westDeg != null
                ? new double[] {s.grid.westDeg, s.grid.eastDeg, s.grid.southDeg, s.grid.northDeg}
                : snap(e.getMinX(), e.getMaxX(), e.getMinY(), e.getMaxY(), d);
        st.studyBox = box;
        if (st.basin.islandCount() > 0) {
            st.warn(RunWarning.Kind.GEOMETRY, "the basin has " + st.basin.islandCount() + " island(s); the gyre solver"
                    + " treats them as described in its own messages below");
        }
        // coast index points along the outer coast of the basin
        st.progress.progress("basin", 0.5, "coast index points");
        try {
            Coastline coast = Coastline.ofBasin(st.basin.mainPolygon(), st.constants);
            if (s.coast != null && s.coast.smoothingKm != null && s.coast.smoothingKm > 0) {
                coast = coast.withSmoothingLengthKm(s.coast.smoothingKm);
            }
            st.coastline = coast;
            List<CoastPoint> pts = new ArrayList<>();
            if (s.coast != null && s.coast.points != null) {
                for (Scenario.NamedPoint p : s.coast.points) pts.add(coast.snap(p.name, p.lonDeg, p.latDeg));
            } else {
                double spacing = s.coast == null || s.coast.spacingKm == null ? 100.0 : s.coast.spacingKm;
                pts.addAll(coast.pointsEvery(spacing, 0, coast.lengthKm()));
            }
            st.coastPoints = pts;
        } catch (IllegalArgumentException ex) {
            throw new StudyException(s.sourceFile, "coast", ex.getMessage(), ex);
        }
        st.progress.progress("basin", 1.0, st.coastPoints.size() + " coast index points");
    }

    /** Bounds widened by one cell and snapped to multiples of the spacing. */
    static double[] snap(double w, double e, double s, double n, double d) {
        return new double[] {Math.floor(w / d) * d - d, Math.ceil(e / d) * d + d,
                Math.max(-90, Math.floor(s / d) * d - d), Math.min(90, Math.ceil(n / d) * d + d)};
    }

    private static DragLaw dragLaw(Scenario s) throws StudyException {
        try {
            if ("constant".equals(s.dragLaw.name)) return DragLaws.constant(s.dragLaw.dragCoefficient);
            return DragLaws.byName(s.dragLaw.name);
        } catch (IllegalArgumentException e) {
            throw new StudyException(s.sourceFile, "dragLaw.name", e.getMessage(), e);
        }
    }

    private void winds(RunState st) throws StudyException, IOException {
        Scenario s = st.scenario;
        Path file = s.resolve(s.winds.file);
        DragLaw law = dragLaw(s);
        st.dragLaw = law;
        Envelope e = st.basin.envelope();
        // one degree of margin so that the coast and the derivatives next to it have data on both sides
        BoundingBox box = new BoundingBox(e.getMinX() - 1, e.getMaxX() + 1, Math.max(-90, e.getMinY() - 1), Math.min(90, e.getMaxY() + 1));
        Instant from = ScenarioValidator.parseInstant(s.winds.start).orElse(null);
        Instant to = ScenarioValidator.parseInstant(s.winds.end).map(t -> s.winds.end.length() <= 10 ? t.plusSeconds(86399) : t).orElse(null);
        VariableMapping mapping = mapping(s);
        boolean pressure = s.winds.source == Scenario.WindSourceKind.PRESSURE;
        st.progress.progress("winds", 0.0, "opening " + file.getFileName());
        boolean station = s.winds.source == Scenario.WindSourceKind.STATION;
        if (!station) {
            try (GriddedSeries whole = pressure
                    ? GriddedSeries.open(file, List.of(VariableRole.SEA_LEVEL_PRESSURE), mapping, BoundingBox.world(), from, to)
                    : GriddedSeries.openWind(file, mapping, BoundingBox.world(), from, to)) {
                checkCoverage(st, whole.grid(), e, file);
            } catch (IllegalArgumentException ex) {
                throw new StudyException(file, "winds", ex.getMessage(), ex);
            } catch (IOException ex) {
                throw new StudyException(file, "winds", GyreplanText.oneLine(ex), ex);
            }
        }
        double[] b = st.studyBox;
        try (WindSteps series = station
                ? WindSteps.station(file, LonLatGrid.covering(b[0], b[1], b[2], b[3], s.grid.spacingDeg, st.constants.earthRadius()), from, to)
                : WindSteps.gridded(file, mapping, box, from, to, pressure, st.constants, st.cutoff)) {
            LonLatGrid raw = series.grid();
            if (!station) checkCoverage(st, raw, e, file);
            LonLatGrid g = st.basin.mask(raw);
            if (g.oceanCount() == 0) {
                throw new StudyException(file, "basin", "no wind-grid cell centre lies inside the basin; the wind grid ("
                        + raw.dLonDeg() + "° spacing) is too coarse for this basin");
            }
            st.windGrid = g;
            int nt = series.size();
            if (nt == 0) throw new StudyException(file, "winds.start/end", "no time steps in the chosen window");
            SurfaceResponse response = new SurfaceResponse(law, st.constants, st.cutoff);
            SurfaceAccumulator acc = new SurfaceAccumulator(g);
            UpwellingStatistics stats = UpwellingStatistics.on(g);
            CoastalUpwellingIndex index = CoastalUpwellingIndex.defaults().withConstants(st.constants)
                    .withCutoff(st.cutoff);
            int np = st.coastPoints.size();
            double[][] ui = new double[np][nt];
            Instant[] times = new Instant[nt];
            int portCell = s.survey != null && s.survey.port != null ? nearestOcean(g, s.survey.port.lonDeg, s.survey.port.latDeg) : -1;
            double[] portWind = portCell >= 0 ? new double[nt] : null;
            // the accumulators, statistics and index sampling consume each step at once, so one set of response
            // arrays is reused across the time loop (memory O(grid), no per-step allocation of six fields)
            SurfaceResponse.Step r = null;
            for (int k = 0; k < nt; k++) {
                st.cancel.check();
                times[k] = series.time(k);
                VectorField wind = series.wind(k, g);
                if (portWind != null) portWind[k] = wind.magnitude(portCell);
                r = response.fromWind(wind, r);
                acc.add(wind, r);
                stats.add(times[k], r.ekmanPumping());
                List<PointIndex> at = index.atPoints(r.stress(), st.coastPoints);
                for (int p = 0; p < np; p++) ui[p][k] = at.get(p).indexM3PerSPer100m();
                if (k % 10 == 0 || k == nt - 1) {
                    st.progress.progress("winds", (k + 1.0) / nt, "step " + (k + 1) + "/" + nt + " "
                            + times[k].toString().substring(0, 10));
                }
            }
            st.times = times;
            st.portWind = portWind;
            st.indexRaw = ui;
            st.stats = stats;
            st.fields.put("wind_speed", acc.meanSpeed());
            VectorField tau = acc.meanStress();
            st.vectors.put("stress", tau);
            st.fields.put("stress_magnitude", magnitude(tau, "wind_stress_magnitude", "magnitude of the time-mean wind stress"));
            st.fields.put("stress_curl", acc.meanCurl());
            VectorField ek = acc.meanEkmanTransport();
            st.vectors.put("ekman_transport", ek);
            st.fields.put("ekman_transport_magnitude", magnitude(ek, "ekman_transport_magnitude", "magnitude of the time-mean Ekman transport per unit width"));
            ScalarField w = acc.meanPumping();
            st.fields.put("ekman_pumping", w);
            st.fields.put("upwelling_persistence", stats.persistenceField().renamed("upwelling_persistence", "1",
                    "fraction of time steps with upward Ekman pumping (0 to 1)"));
            st.headlines.put(Headline.TIME_STEPS, (double) nt);
            st.headlines.put(Headline.OCEAN_CELLS, (double) g.oceanCount());
            st.headlines.put(Headline.MEAN_WIND_SPEED, acc.meanSpeed().areaMean());
            st.headlines.put(Headline.MEAN_EASTWARD_STRESS, tau.eastward().areaMean());
            st.headlines.put(Headline.MEAN_NORTHWARD_STRESS, tau.northward().areaMean());
            st.headlines.put(Headline.MAX_MEAN_STRESS, st.fields.get("stress_magnitude").range()[1]);
            st.headlines.put(Headline.MEAN_EKMAN_PUMPING, w.areaMean());
            st.headlines.put(Headline.MAX_EKMAN_PUMPING, w.range()[1]);
            st.headlines.put(Headline.MIN_EKMAN_PUMPING, w.range()[0]);
            st.headlines.put(Headline.EQUATORIAL_CELLS, (double) acc.cutoffCells());
            if (acc.cutoffCells() > 0) {
                st.warn(RunWarning.Kind.EQUATORIAL, acc.cutoffCells() + " ocean cells lie within " + st.cutoff.latitudeDeg()
                        + "° of the equator; Ekman transport and pumping are undefined there and left empty");
            }
            if (acc.missingOceanValues() > 0) {
                st.warn(RunWarning.Kind.DATA_GAP, acc.missingOceanValues() + " missing wind values over ocean cells ("
                        + String.format(Locale.ROOT, "%.2f", 100.0 * acc.missingOceanValues() / ((double) nt * g.oceanCount()))
                        + " % of cell-steps); means use the available steps of each cell");
            }
            if (acc.dragOutOfRange() > 0) {
                st.warn(RunWarning.Kind.DRAG_RANGE, acc.dragOutOfRange() + " cell-steps had wind speeds outside the validity range of "
                        + law.name() + " (" + String.format(Locale.ROOT, "%.2f", 100.0 * acc.dragOutOfRange() / ((double) nt * g.oceanCount()))
                        + " % of cell-steps)");
            }
            st.provenanceExtra.put("wind grid", raw.nx() + " × " + raw.ny() + " cells of " + raw.dLonDeg() + "° × "
                    + raw.dLatDeg() + "°, " + g.oceanCount() + " inside the basin");
            st.provenanceExtra.put("time steps", nt + " (" + times[0] + " to " + times[nt - 1] + ")");
            st.provenanceExtra.put("wind input", series.describe());
            if (station) {
                st.warn(RunWarning.Kind.OTHER, "station winds are applied uniformly over the basin; curl-driven results (Ekman"
                        + " pumping, upwelling zones, the gyre) then reflect no real wind-stress curl: use this run for the coastal index");
            }
        } catch (IllegalArgumentException ex) {
            throw new StudyException(file, "winds", ex.getMessage(), ex);
        } catch (IOException ex) {
            if (ex instanceof java.nio.file.NoSuchFileException) throw ex;
            throw new StudyException(file, "winds", GyreplanText.oneLine(ex), ex);
        }
    }

    /**
     * Removes one-cell spurs of the mask: ocean cells with neither an east nor a west ocean neighbour, or neither a
     * north nor a south one, where a centred derivative (and so the stress curl) has no data. Repeats until stable.
     */
    static LonLatGrid trimSpurs(LonLatGrid g, int[] count) {
        boolean[] ocean = g.oceanMask();
        boolean changed = true;
        while (changed) {
            changed = false;
            for (int j = 0; j < g.ny(); j++) {
                for (int i = 0; i < g.nx(); i++) {
                    int k = g.index(i, j);
                    if (!ocean[k]) continue;
                    boolean ew = (i > 0 && ocean[k - 1]) || (i < g.nx() - 1 && ocean[k + 1]);
                    boolean ns = (j > 0 && ocean[k - g.nx()]) || (j < g.ny() - 1 && ocean[k + g.nx()]);
                    if (!ew || !ns) { ocean[k] = false; count[0]++; changed = true; }
                }
            }
        }
        return count[0] == 0 ? g : g.withOcean(ocean);
    }

    /** Flat index of the wind cell with finite values nearest to a position (grid distance), or −1. */
    static int nearestFinite(LonLatGrid g, double[] a, double[] b, double lonDeg, double latDeg) {
        double x = g.columnOf(lonDeg), y = g.rowOf(latDeg);
        double c = Math.cos(Math.toRadians(latDeg)) * g.dLonDeg() / g.dLatDeg();
        int best = -1;
        double bd = Double.POSITIVE_INFINITY;
        for (int j = 0; j < g.ny(); j++) {
            for (int i = 0; i < g.nx(); i++) {
                int k = g.index(i, j);
                if (!(Double.isFinite(a[k]) && Double.isFinite(b[k]))) continue;
                double dd = Math.hypot((i - x) * c, j - y);
                if (dd < bd) { bd = dd; best = k; }
            }
        }
        return best;
    }

    /** Flat index of the ocean cell nearest to a position (by grid distance), or −1 if the grid has none. */
    static int nearestOcean(LonLatGrid g, double lonDeg, double latDeg) {
        double x = g.columnOf(lonDeg), y = g.rowOf(latDeg);
        int best = -1;
        double bd = Double.POSITIVE_INFINITY;
        double c = Math.cos(Math.toRadians(latDeg)) * g.dLonDeg() / g.dLatDeg();
        for (int j = 0; j < g.ny(); j++) {
            for (int i = 0; i < g.nx(); i++) {
                int k = g.index(i, j);
                if (!g.isOcean(k)) continue;
                double d = Math.hypot((i - x) * c, j - y);
                if (d < bd) { bd = d; best = k; }
            }
        }
        return best;
    }

    private static ScalarField on(LonLatGrid masked, ScalarField f) {
        double[] v = f.values().clone();
        for (int k = 0; k < v.length; k++) if (!masked.isOcean(k)) v[k] = Double.NaN;
        return new ScalarField(masked, v, f.name(), f.units(), f.longName());
    }

    private static ScalarField magnitude(VectorField v, String name, String longName) {
        double[] m = new double[v.grid().size()];
        for (int k = 0; k < m.length; k++) m[k] = v.magnitude(k);
        return new ScalarField(v.grid(), m, name, v.units(), longName);
    }

    private static VariableMapping mapping(Scenario s) {
        VariableMapping m = VariableMapping.automatic();
        if (s.winds.variables == null) return m;
        for (Map.Entry<String, String> e : s.winds.variables.entrySet()) {
            VariableRole role = switch (e.getKey()) {
                case "eastward" -> VariableRole.EASTWARD_WIND;
                case "northward" -> VariableRole.NORTHWARD_WIND;
                case "pressure" -> VariableRole.SEA_LEVEL_PRESSURE;
                default -> null;
            };
            if (role != null) m = m.with(role, e.getValue());
        }
        return m;
    }

    /** The basin must lie inside the wind data (half a wind cell of tolerance). */
    private static void checkCoverage(RunState st, LonLatGrid raw, Envelope e, Path file) throws StudyException {
        double tolLon = 0.5 * raw.dLonDeg(), tolLat = 0.5 * raw.dLatDeg();
        double w = raw.lon0Deg(), east = raw.lonDeg(raw.nx() - 1), s = raw.latDeg(0), n = raw.latDeg(raw.ny() - 1);
        boolean inside = e.getMinX() >= w - tolLon && e.getMaxX() <= east + tolLon && e.getMinY() >= s - tolLat && e.getMaxY() <= n + tolLat;
        if (!inside) {
            throw new StudyException(file, "basin", String.format(Locale.ROOT,
                    "the basin (%s; lon %.2f…%.2f°, lat %.2f…%.2f°) extends outside the wind data (cell centres lon %.2f…%.2f°, lat %.2f…%.2f°);"
                            + " use wind data that cover the basin or a smaller basin",
                    st.scenario.where("/basin"), e.getMinX(), e.getMaxX(), e.getMinY(), e.getMaxY(), w, east, s, n));
        }
    }

    private void gyre(RunState st) throws StudyException {
        Scenario s = st.scenario;
        st.cancel.check();
        double d = s.gyre.spacingDeg != null ? s.gyre.spacingDeg : s.grid.spacingDeg;
        double[] b = st.studyBox;
        LonLatGrid g = st.basin.mask(LonLatGrid.covering(b[0], b[1], b[2], b[3], d, st.constants.earthRadius()));
        int[] trimmed = new int[1];
        g = trimSpurs(g, trimmed);
        if (trimmed[0] > 0) {
            st.warn(RunWarning.Kind.GEOMETRY, trimmed[0] + " gyre-grid ocean cells with no ocean neighbour to the east or west,"
                    + " or to the north or south (corners of the coast polygon), were treated as land so that the stress curl is defined");
        }
        st.grid = g;
        VectorField tauWind = st.vectors.get("stress");
        double[] tx = new double[g.size()], ty = new double[g.size()];
        int filled = 0;
        LonLatGrid wg = tauWind.grid();
        double[] wx = tauWind.eastward().values(), wy = tauWind.northward().values();
        for (int j = 0; j < g.ny(); j++) {
            for (int i = 0; i < g.nx(); i++) {
                int k = g.index(i, j);
                boolean ocean = g.isOcean(k);
                tx[k] = ocean ? tauWind.eastward().interpolate(g.lonDeg(i), g.latDeg(j)) : Double.NaN;
                ty[k] = ocean ? tauWind.northward().interpolate(g.lonDeg(i), g.latDeg(j)) : Double.NaN;
                if (ocean && !(Double.isFinite(tx[k]) && Double.isFinite(ty[k]))) {
                    // the gyre grid reaches closer to the coast than the wind grid: take the nearest wind cell with data
                    int n = nearestFinite(wg, wx, wy, g.lonDeg(i), g.latDeg(j));
                    if (n >= 0) { tx[k] = wx[n]; ty[k] = wy[n]; filled++; }
                }
            }
        }
        if (filled > 0) {
            st.warn(RunWarning.Kind.RESOLUTION, filled + " gyre-grid cells next to the coast lie between wind-grid cell centres;"
                    + " they take the mean stress of the nearest wind cell (" + wg.dLonDeg() + "° wind grid, " + d + "° gyre grid)");
        }
        VectorField tau = new VectorField(new ScalarField(g, tx, tauWind.eastward().name(), "Pa", tauWind.eastward().longName()),
                new ScalarField(g, ty, tauWind.northward().name(), "Pa", tauWind.northward().longName()));
        if (s.gyre.model == Scenario.GyreModel.SVERDRUP) {
            // the frictionless interior: no boundary layer, no linear solve (Sverdrup 1947)
            ScalarField psi = Sverdrup.streamfunction(tau, Geometry.sphere(), st.constants);
            st.fields.put("streamfunction", psi);
            double[] r = psi.range();
            st.headlines.put(Headline.MAX_STREAMFUNCTION, r[1]);
            st.headlines.put(Headline.MIN_STREAMFUNCTION, r[0]);
            st.headlines.put(Headline.MAX_SVERDRUP, r[1]);
            st.provenanceExtra.put("gyre grid", g.nx() + " × " + g.ny() + " cells of " + d + "°, " + g.oceanCount() + " ocean");
            st.progress.progress("gyre", 1.0, String.format(Locale.ROOT, "Sverdrup ψ %.1f…%.1f Sv", r[0], r[1]));
            return;
        }
        // results are bit-identical for any thread count (GyreSolverBehaviourTest), so use the machine's cores
        GyreProblem.Builder pb = GyreProblem.on(g).stress(tau).constants(st.constants).depth(s.gyre.depth)
                .geometry(Geometry.sphere()).options(GyreProblem.Options.defaults());
        switch (s.gyre.model) {
            case STOMMEL -> pb.stommel(s.gyre.bottomFriction);
            case MUNK -> {
                pb.munk(s.gyre.lateralViscosity, s.gyre.wall == Scenario.Wall.FREE_SLIP ? WallCondition.FREE_SLIP : WallCondition.NO_SLIP);
                if (s.gyre.bottomFriction != null) pb.stommel(s.gyre.bottomFriction);
            }
            case SVERDRUP -> throw new IllegalStateException("handled above");
        }
        GyreSolution sol;
        try {
            sol = GyreSolver.solve(pb.build(), (stage, f, m) -> st.progress.progress("gyre", f, m), st.cancel);
        } catch (GyreException ex) {
            st.warn(RunWarning.Kind.GEOMETRY, "gyre not solved: " + ex.getMessage());
            st.progress.progress("gyre", 1.0, "not solved");
            return;
        } catch (IllegalArgumentException ex) {
            throw new StudyException(s.sourceFile, "gyre", ex.getMessage(), ex);
        }
        ScalarField psi = sol.streamfunction();
        st.fields.put("streamfunction", psi);
        st.gyre = sol;
        for (String w : sol.warnings()) {
            RunWarning.Kind k = w.toLowerCase(Locale.ROOT).contains("resolution")
                    ? RunWarning.Kind.RESOLUTION : RunWarning.Kind.GEOMETRY;
            st.warn(k, "gyre: " + w);
        }
        double[] r = psi.range();
        st.headlines.put(Headline.MAX_STREAMFUNCTION, r[1]);
        st.headlines.put(Headline.MIN_STREAMFUNCTION, r[0]);
        if (sol.sverdrup() != null) st.headlines.put(Headline.MAX_SVERDRUP, sol.sverdrup().range()[1]);
        if (sol.diagnostics() != null && Double.isFinite(sol.diagnostics().peakTransportSv())) {
            st.headlines.put(Headline.WESTERN_BOUNDARY_TRANSPORT, sol.diagnostics().peakTransportSv());
        }
        st.provenanceExtra.put("gyre grid", g.nx() + " × " + g.ny() + " cells of " + d + "°, " + g.oceanCount() + " ocean");
        st.progress.progress("gyre", 1.0, String.format(Locale.ROOT, "ψ %.1f…%.1f Sv", r[0], r[1]));
    }

    private void coast(RunState st) {
        st.cancel.check();
        int np = st.coastPoints.size();
        List<LocalDate> days = new ArrayList<>();
        for (Instant t : st.times) days.add(t.atZone(ZoneOffset.UTC).toLocalDate());
        double[] meanOver = new double[st.times.length];
        int[] countOver = new int[st.times.length];
        List<CoastSeries> out = new ArrayList<>();
        for (int p = 0; p < np; p++) {
            CoastPoint cp = st.coastPoints.get(p);
            TimeSeries raw = TimeSeries.of(cp.name(), CoastalUpwellingIndex.UNITS, st.times, st.indexRaw[p]);
            out.add(CoastSeries.of(cp, raw));
            for (int k = 0; k < st.times.length; k++) {
                if (Double.isFinite(st.indexRaw[p][k])) { meanOver[k] += st.indexRaw[p][k]; countOver[k]++; }
            }
            st.progress.progress("coast", (p + 1.0) / (np + 1), cp.name());
        }
        for (int k = 0; k < meanOver.length; k++) meanOver[k] = countOver[k] > 0 ? meanOver[k] / countOver[k] : Double.NaN;
        st.coastSeries = out;
        if (np > 0) {
            CoastSeries all = CoastSeries.of(null, TimeSeries.of("coast mean", CoastalUpwellingIndex.UNITS, st.times, meanOver));
            st.coastMean = all;
            double sum = 0; int n = 0;
            for (double v : all.daily().values()) if (Double.isFinite(v)) { sum += v; n++; }
            if (n > 0) st.headlines.put(Headline.MEAN_COASTAL_INDEX, sum / n);
            if (all.climatology() != null && all.climatology().maxMonth() >= 1) {
                st.headlines.put(Headline.PEAK_INDEX_MONTH, (double) all.climatology().maxMonth());
            }
            double sti = 0; int ns = 0;
            for (UpwellingSeason.Season s : all.seasons()) if (s.isResolved()) { sti += s.springTransitionDay(); ns++; }
            if (ns > 0) st.headlines.put(Headline.SPRING_TRANSITION_DAY, sti / ns);
        }
        for (CoastSeries cs : out) {
            double[] v = cs.daily().values();
            List<LocalDate> d = new ArrayList<>();
            for (int k = 0; k < cs.daily().size(); k++) d.add(cs.daily().time(k).atZone(ZoneOffset.UTC).toLocalDate());
            st.series.add(new NamedSeries(cs.point().name(), "coastal upwelling index", CoastalUpwellingIndex.UNITS, d, v,
                    cs.point().lonDeg(), cs.point().latDeg()));
        }
        st.progress.progress("coast", 1.0, np + " index series");
    }

    /** Daily, monthly, climatology and seasons of one coastal index series. */
    record CoastSeries(CoastPoint point, TimeSeries daily, TimeSeries monthly, MonthlyClimatology climatology,
                       List<UpwellingSeason.Season> seasons) {
        static CoastSeries of(CoastPoint p, TimeSeries raw) {
            TimeSeries daily = raw.medianStepSeconds() >= 86400 ? raw : Aggregation.daily(raw, Coverage.DEFAULT).means();
            TimeSeries monthly = Aggregation.monthly(daily, Coverage.DEFAULT).means();
            MonthlyClimatology clim = null;
            if (monthly.size() > 0) {
                int y0 = monthly.time(0).atZone(ZoneOffset.UTC).getYear();
                int y1 = monthly.time(monthly.size() - 1).atZone(ZoneOffset.UTC).getYear();
                try {
                    clim = MonthlyClimatology.of(monthly, y0, y1, 1);
                } catch (IllegalArgumentException e) {
                    clim = null;
                }
            }
            List<UpwellingSeason.Season> seasons = UpwellingSeason.perYear(daily, UpwellingSeason.Options.DEFAULT);
            return new CoastSeries(p, daily, monthly, clim, seasons);
        }
    }

    // ------------------------------------------------------------------------------------------- helpers

    static PhysicalConstants constants(Scenario s) {
        PhysicalConstants c = PhysicalConstants.DEFAULT;
        Scenario.Constants k = s.constants;
        if (k == null) return c;
        if (k.rho0 != null) c = c.withRho0(k.rho0);
        if (k.rhoAir != null) c = c.withRhoAir(k.rhoAir);
        if (k.omega != null) c = c.withOmega(k.omega);
        if (k.earthRadius != null) c = c.withEarthRadius(k.earthRadius);
        return c;
    }

    Provenance provenance(RunState st, Instant started) {
        Map<String, String> p = new LinkedHashMap<>();
        Scenario s = st.scenario;
        PhysicalConstants c = st.constants == null ? constants(s) : st.constants;
        p.put("scenario", s.sourceFile == null ? "(in memory)" : s.sourceFile.toString());
        p.put("basin", (s.basin.name == null ? "" : s.basin.name + ", ") + (s.basin.polygon != null ? s.basin.polygon : "inline coordinates"));
        if (st.grid != null) p.put("study grid", st.grid.nx() + " × " + st.grid.ny() + " cells, lon "
                + fmt(st.grid.westDeg()) + "…" + fmt(st.grid.eastDeg()) + "°, lat " + fmt(st.grid.southDeg()) + "…" + fmt(st.grid.northDeg()) + "°");
        p.put("wind source", s.winds.source.name().toLowerCase(Locale.ROOT) + " " + s.winds.file);
        p.put("time window", (s.winds.start == null ? "start of data" : s.winds.start) + " to "
                + (s.winds.end == null ? "end of data" : s.winds.end));
        p.put("drag law", st.dragLaw != null ? st.dragLaw.name() + " (" + st.dragLaw.id() + ")" : s.dragLaw.name);
        p.put("ρ₀ (sea water)", c.rho0() + " kg m⁻³");
        p.put("ρₐ (air)", c.rhoAir() + " kg m⁻³");
        p.put("Ω", c.omega() + " rad s⁻¹");
        p.put("R (Earth radius)", c.earthRadius() + " m");
        p.put("equatorial cut-off", (s.constants.equatorialCutoffDeg == null ? 5.0 : s.constants.equatorialCutoffDeg) + "° (Ekman quantities undefined closer to the equator)");
        p.put("gyre model", s.gyre.model.name().toLowerCase(Locale.ROOT)
                + (s.gyre.bottomFriction != null ? ", r = " + s.gyre.bottomFriction + " s⁻¹" : "")
                + (s.gyre.lateralViscosity != null ? ", A_H = " + s.gyre.lateralViscosity + " m² s⁻¹" : "")
                + (s.gyre.wall != null ? ", " + s.gyre.wall.name().toLowerCase(Locale.ROOT).replace('_', '-') + " walls" : "")
                + ", H = " + s.gyre.depth + " m");
        if (s.coast != null) p.put("coast index", (s.coast.points != null ? s.coast.points.size() + " named points" : "every " + s.coast.spacingKm + " km")
                + ", orientation smoothed over " + s.coast.smoothingKm + " km, band " + s.coast.bandWidthKm + " km");
        p.putAll(st.provenanceExtra);
        return new Provenance(List.copyOf(st.inputs), p, Version.current(), System.getProperty("java.version"),
                started, Instant.now());
    }

    static String fmt(double v) { return String.format(Locale.ROOT, "%.2f", v); }

    /** SHA-256 of a file as lower-case hex. */
    public static String sha256(Path p) throws IOException {
        try (InputStream in = Files.newInputStream(p)) {
            MessageDigest md = MessageDigest.getInstance("SHA-256");
            byte[] buf = new byte[1 << 16];
            int n;
            while ((n = in.read(buf)) > 0) md.update(buf, 0, n);
            return HexFormat.of().formatHex(md.digest());
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required by every Java runtime", e);
        }
    }

    /** Mutable state of one run. */
    static final class RunState {
        final Scenario scenario;
        final ProgressListener progress;
        final CancelToken cancel;
        final List<Provenance.InputFile> inputs = new ArrayList<>();
        final Map<String, ScalarField> fields = new LinkedHashMap<>();
        final Map<String, VectorField> vectors = new LinkedHashMap<>();
        final List<NamedSeries> series = new ArrayList<>();
        final Map<Headline, Double> headlines = new EnumMap<>(Headline.class);
        final List<RunWarning> warnings = new ArrayList<>();
        final Map<String, Object> products = new LinkedHashMap<>();
        final Map<String, String> provenanceExtra = new LinkedHashMap<>();
        PhysicalConstants constants;
        EquatorialCutoff cutoff;
        DragLaw dragLaw;
        BasinGeometry basin;
        double[] studyBox;
        Coastline coastline;
        List<CoastPoint> coastPoints = List.of();
        LonLatGrid windGrid;
        LonLatGrid grid;
        Instant[] times = new Instant[0];
        double[][] indexRaw = new double[0][];
        double[] portWind;
        UpwellingStatistics stats;
        GyreSolution gyre;
        List<CoastSeries> coastSeries = List.of();
        CoastSeries coastMean;
        OutputFolder out;

        RunState(Scenario scenario, ProgressListener progress, CancelToken cancel) {
            this.scenario = scenario;
            this.progress = progress;
            this.cancel = cancel;
        }

        void warn(RunWarning.Kind kind, String message) { warnings.add(new RunWarning(kind, message)); }

        StudyResult result(Path dir, List<Path> files, Provenance prov) {
            return new StudyResult(scenario, dir, grid != null ? grid : windGrid, fields, vectors, series, headlines,
                    warnings, files, products, prov);
        }
    }
}
