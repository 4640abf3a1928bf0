package org.gyreplan.app.pipeline;

import org.gyreplan.app.report.ReportWriter;
import org.gyreplan.app.render.MapRenderer;
import org.gyreplan.app.scenario.Headline;
import org.gyreplan.app.scenario.Scenario;
import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.CancelledException;
import org.gyreplan.solver.progress.ProgressListener;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Instant;
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
 * <p>Stages (each reports progress under its name): inputs (checksums) → grid and basin mask → winds, stress,
 * Ekman (streamed per time step, memory O(grid)) → gyre → coastal index → planning → outputs. Outputs are staged
 * in a hidden folder and moved into {@code outDir} only when the run completes; on cancel or failure nothing is
 * left behind. The physics itself lives in the solver; this class only connects the pieces.
 */
public final class StudyPipeline {

    /** Stage names, in order, as reported to the {@link ProgressListener}. */
    public static final List<String> STAGES = List.of("inputs", "grid", "winds", "gyre", "coast", "planning", "outputs");

    /**
     * Runs a scenario.
     *
     * @param scenario a validated scenario (see {@code ScenarioFiles.load})
     * @param outDir   folder for the outputs (created; existing files of the same names are replaced)
     * @param progress receives stage, fraction and message
     * @param cancel   polled between time steps and stages; when cancelled the run throws
     *                 {@link CancelledException} and leaves no partial files
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
            grid(st);
            st.cancel.check();
            // Later stages (winds → stress → Ekman, gyre, coast, planning) are added here as the solver provides them.
            outputs(st, started);
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
        for (int k = 0; k < files.size(); k++) {
            st.cancel.check();
            Path p = s.resolve(files.get(k)[1]);
            if (!Files.isRegularFile(p)) throw new StudyException(p, files.get(k)[0], "file not found");
            st.progress.progress("inputs", (double) k / files.size(), "checksum " + p.getFileName());
            st.inputs.add(new Provenance.InputFile(files.get(k)[0], p.toString(), Files.size(p), sha256(p)));
        }
        st.progress.progress("inputs", 1.0, files.size() + " input files");
    }

    private void grid(RunState st) throws StudyException {
        Scenario s = st.scenario;
        st.progress.progress("grid", 0.0, "study grid");
        st.constants = constants(s);
        double[] box = bounds(s);
        double d = s.grid.spacingDeg;
        LonLatGrid g = LonLatGrid.covering(box[0], box[1], box[2], box[3], d, st.constants.earthRadius());
        st.grid = g;
        st.warn(RunWarning.Kind.GEOMETRY, "the basin mask is not applied in this build (polygon rasterising is not"
                + " available yet); all cells of the grid bounds are treated as ocean");
        double[] f = new double[g.size()], beta = new double[g.size()];
        for (int j = 0; j < g.ny(); j++) {
            double lat = g.latDeg(j);
            for (int i = 0; i < g.nx(); i++) {
                int k = g.index(i, j);
                f[k] = g.isOcean(k) ? st.constants.coriolis(lat) : Double.NaN;
                beta[k] = g.isOcean(k) ? st.constants.beta(lat) : Double.NaN;
            }
        }
        st.fields.put("coriolis", new ScalarField(g, f, "coriolis_parameter", "s-1",
                "Coriolis parameter f = 2 Omega sin(latitude), positive in the northern hemisphere"));
        st.fields.put("beta", new ScalarField(g, beta, "beta", "m-1 s-1",
                "meridional gradient of the Coriolis parameter, beta = 2 Omega cos(latitude) / R"));
        st.headlines.put(Headline.OCEAN_CELLS, (double) g.oceanCount());
        st.progress.progress("grid", 1.0, g.nx() + " × " + g.ny() + " cells of " + d + "°");
    }

    /** Grid bounds (west, east, south, north; cell edges, degrees) from the scenario. */
    private static double[] bounds(Scenario s) throws StudyException {
        Scenario.GridSpec g = s.grid;
        if (g.westDeg != null) return new double[] {g.westDeg, g.eastDeg, g.southDeg, g.northDeg};
        if (s.basin.coordinates != null) {
            double w = Double.POSITIVE_INFINITY, e = Double.NEGATIVE_INFINITY, so = Double.POSITIVE_INFINITY, n = Double.NEGATIVE_INFINITY;
            for (List<Double> p : s.basin.coordinates) {
                w = Math.min(w, p.get(0)); e = Math.max(e, p.get(0));
                so = Math.min(so, p.get(1)); n = Math.max(n, p.get(1));
            }
            return snap(w, e, so, n, g.spacingDeg);
        }
        throw new StudyException(s.resolve(s.basin.polygon), "basin.polygon",
                "reading basin polygon files is not available in this build; give basin.coordinates or grid bounds");
    }

    /** Bounds widened by one cell and snapped to multiples of the spacing. */
    static double[] snap(double w, double e, double s, double n, double d) {
        return new double[] {Math.floor(w / d) * d - d, Math.ceil(e / d) * d + d,
                Math.max(-90, Math.floor(s / d) * d - d), Math.min(90, Math.ceil(n / d) * d + d)};
    }

    private void outputs(RunState st, Instant started) throws IOException {
        st.cancel.check();
        Scenario s = st.scenario;
        List<Map.Entry<String, ScalarField>> mapped = new ArrayList<>(st.fields.entrySet());
        if (s.wants(Scenario.Output.MAPS)) {
            MapRenderer r = new MapRenderer();
            for (int k = 0; k < mapped.size(); k++) {
                st.cancel.check();
                var e = mapped.get(k);
                st.progress.progress("outputs", 0.8 * k / mapped.size(), "map " + e.getKey());
                byte[] png = r.renderPng(MapRenderer.MapSpec.of(e.getValue(), titleOf(e.getValue())));
                st.out.write("maps/" + e.getKey() + ".png", o -> o.write(png));
            }
        }
        if (s.wants(Scenario.Output.REPORT)) {
            st.progress.progress("outputs", 0.9, "report");
            StudyResult draft = st.result(st.out.target(), st.out.files(), provenance(st, started));
            String html = new ReportWriter().html(draft, rel -> {
                Path p = st.out.staged(rel);
                return Files.exists(p) ? Files.readAllBytes(p) : null;
            });
            st.out.writeString("report.html", html);
        }
    }

    private static String titleOf(ScalarField f) {
        return f.longName() + " (" + f.units() + ")";
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

    private Provenance provenance(RunState st, Instant started) {
        Map<String, String> p = new LinkedHashMap<>();
        Scenario s = st.scenario;
        PhysicalConstants c = st.constants == null ? constants(s) : st.constants;
        p.put("scenario", s.sourceFile == null ? "(in memory)" : s.sourceFile.toString());
        p.put("grid spacing", s.grid.spacingDeg + "°");
        if (st.grid != null) p.put("grid", st.grid.nx() + " × " + st.grid.ny() + " cells, lon "
                + fmt(st.grid.westDeg()) + "…" + fmt(st.grid.eastDeg()) + "°, lat " + fmt(st.grid.southDeg()) + "…" + fmt(st.grid.northDeg()) + "°");
        p.put("wind source", s.winds.source.name().toLowerCase(Locale.ROOT) + " " + s.winds.file);
        p.put("time window", (s.winds.start == null ? "start of data" : s.winds.start) + " to "
                + (s.winds.end == null ? "end of data" : s.winds.end));
        p.put("drag law", s.dragLaw.name + (s.dragLaw.dragCoefficient != null ? " (C_D = " + s.dragLaw.dragCoefficient + ")" : ""));
        p.put("ρ₀ (sea water)", c.rho0() + " kg m⁻³");
        p.put("ρₐ (air)", c.rhoAir() + " kg m⁻³");
        p.put("Ω", c.omega() + " rad s⁻¹");
        p.put("R (Earth radius)", c.earthRadius() + " m");
        p.put("equatorial cut-off", s.constants.equatorialCutoffDeg + "°");
        p.put("gyre model", s.gyre.model.name().toLowerCase(Locale.ROOT)
                + (s.gyre.bottomFriction != null ? ", r = " + s.gyre.bottomFriction + " s⁻¹" : "")
                + (s.gyre.lateralViscosity != null ? ", A_H = " + s.gyre.lateralViscosity + " m² s⁻¹" : "")
                + (s.gyre.wall != null ? ", " + s.gyre.wall.name().toLowerCase(Locale.ROOT).replace('_', '-') + " walls" : "")
                + ", H = " + s.gyre.depth + " m");
        if (s.coast != null) p.put("coast index", "spacing " + s.coast.spacingKm + " km, smoothing "
                + s.coast.smoothingKm + " km, band " + s.coast.bandWidthKm + " km");
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
        PhysicalConstants constants;
        LonLatGrid grid;
        OutputFolder out;

        RunState(Scenario scenario, ProgressListener progress, CancelToken cancel) {
            this.scenario = scenario;
            this.progress = progress;
            this.cancel = cancel;
        }

        void warn(RunWarning.Kind kind, String message) { warnings.add(new RunWarning(kind, message)); }

        StudyResult result(Path dir, List<Path> files, Provenance prov) {
            return new StudyResult(scenario, dir, grid, fields, vectors, series, headlines, warnings, files, products, prov);
        }
    }
}
