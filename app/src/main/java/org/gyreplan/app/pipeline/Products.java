package org.gyreplan.app.pipeline;

import org.gyreplan.app.render.ChartRenderer;
import org.gyreplan.app.render.ColorScale;
import org.gyreplan.app.render.Contours;
import org.gyreplan.app.render.MapRenderer;
import org.gyreplan.app.report.ReportWriter;
import org.gyreplan.app.scenario.Scenario;
import org.gyreplan.gisdata.cf.CfNetcdfWriter;
import org.gyreplan.gisdata.csv.CsvTable;
import org.gyreplan.gisdata.raster.GeoTiffWriter;
import org.gyreplan.gisdata.vector.Feature;
import org.gyreplan.gisdata.vector.FeatureLayer;
import org.gyreplan.gisdata.vector.GeoJsonFiles;
import org.gyreplan.gisdata.vector.GeoPackageFiles;
import org.gyreplan.gisdata.vector.GpxFiles;
import org.gyreplan.gisdata.vector.KmlFiles;
import org.gyreplan.solver.coast.CoastPoint;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;
import org.gyreplan.solver.gyre.BoundaryCurrentDiagnostics;
import org.gyreplan.solver.plan.mooring.ChosenSite;
import org.gyreplan.solver.plan.mooring.SitingResult;
import org.gyreplan.solver.plan.survey.CruiseSchedule;
import org.gyreplan.solver.plan.survey.Leg;
import org.gyreplan.solver.plan.survey.LegRow;
import org.gyreplan.solver.plan.survey.Route;
import org.gyreplan.solver.plan.survey.Stop;
import org.gyreplan.solver.plan.zones.UpwellingZone;
import org.gyreplan.solver.series.MonthlyClimatology;
import org.gyreplan.solver.series.TimeSeries;
import org.gyreplan.solver.series.UpwellingSeason;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;

import java.awt.Color;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** Output stage: maps, charts, tables and exports into the run's staging folder, then the report. */
final class Products {
    private static final GeometryFactory GF = new GeometryFactory();
    static final Color ZONE = new Color(0x0D, 0x6E, 0x5A);
    static final Color MOORING = new Color(0xE0, 0x3A, 0x3A);
    static final Color PORT = new Color(0x33, 0x33, 0x33);
    static final Color INDEX_POINT = new Color(0xF2, 0xC1, 0x2E);
    static final Color EXCLUSION = new Color(0x8E, 0x24, 0xAA);

    private final StudyPipeline.RunState st;
    private final Scenario s;
    private final ReportWriter report = new ReportWriter();
    private int step, steps = 12;

    Products(StudyPipeline.RunState st) {
        this.st = st;
        this.s = st.scenario;
    }

    private void tick(String what) {
        st.cancel.check();
        st.progress.progress("outputs", Math.min(0.95, (double) step++ / steps), what);
    }

    void write(Instant started) throws IOException {
        if (s.wants(Scenario.Output.MAPS)) maps();
        if (s.wants(Scenario.Output.MAPS)) charts();
        if (s.wants(Scenario.Output.CSV)) csv();
        if (s.wants(Scenario.Output.NETCDF)) netcdf();
        if (s.wants(Scenario.Output.GEOTIFF)) geotiff();
        vectors();
        sections();
        if (s.wants(Scenario.Output.REPORT)) {
            tick("report");
            StudyResult draft = st.result(st.out.target(), st.out.files(), new StudyPipeline().provenance(st, started));
            String html = report.html(draft, rel -> {
                var p = st.out.staged(rel);
                return Files.exists(p) ? Files.readAllBytes(p) : null;
            });
            st.out.writeString("report.html", html);
        }
    }

    // ------------------------------------------------------------------------------------------- maps

    private MapRenderer.MapSpec base(ScalarField f, String title, String subtitle) {
        MapRenderer.MapSpec m = MapRenderer.MapSpec.of(f, title).subtitle(subtitle);
        for (List<double[]> ring : st.basin.rings()) m.coastline(ring);
        ScalarField depth = (ScalarField) st.products.get(Planning.DEPTH);
        if (depth != null) m.shading(negate(depth));
        List<?> ex = (List<?>) st.products.getOrDefault(Planning.EXCLUSIONS, List.of());
        boolean first = true;
        for (Object o : ex) {
            for (List<double[]> ring : rings((Geometry) o)) {
                m.overlay(new MapRenderer.Overlay(MapRenderer.Overlay.Kind.AREA, first ? "exclusion zone" : null, EXCLUSION, ring, null));
                first = false;
            }
        }
        return m;
    }

    private static ScalarField negate(ScalarField depth) {
        double[] v = depth.values().clone();
        for (int k = 0; k < v.length; k++) v[k] = -v[k];
        return new ScalarField(depth.grid(), v, "elevation", "m", "elevation");
    }

    private List<double[]> trackPoints() {
        Route route = (Route) st.products.get(Planning.ROUTE);
        List<double[]> pts = new ArrayList<>();
        if (route == null) return pts;
        for (Leg l : route.legs()) {
            for (double[] w : l.waypoints()) {
                if (pts.isEmpty() || pts.get(pts.size() - 1)[0] != w[0] || pts.get(pts.size() - 1)[1] != w[1]) pts.add(w);
            }
        }
        return pts;
    }

    private void addPlanOverlays(MapRenderer.MapSpec m) {
        List<double[]> track = trackPoints();
        if (!track.isEmpty()) {
            m.overlay(new MapRenderer.Overlay(MapRenderer.Overlay.Kind.TRACK, "survey track and stations", new Color(0x1B, 0x26, 0x4F), track, null));
        }
        if (!st.coastPoints.isEmpty()) {
            List<double[]> pts = new ArrayList<>();
            List<String> labels = new ArrayList<>();
            boolean label = st.coastPoints.size() <= 12;
            for (CoastPoint p : st.coastPoints) { pts.add(new double[] {p.lonDeg(), p.latDeg()}); labels.add(label ? p.name() : null); }
            m.overlay(new MapRenderer.Overlay(MapRenderer.Overlay.Kind.POINTS, "coastal index point", INDEX_POINT, pts, labels));
        }
        SitingResult sr = (SitingResult) st.products.get(Planning.SITING);
        if (sr != null && !sr.sites().isEmpty()) {
            List<double[]> pts = new ArrayList<>();
            List<String> labels = new ArrayList<>();
            for (ChosenSite c : sr.sites()) {
                pts.add(new double[] {c.candidate().lonDeg(), c.candidate().latDeg()});
                labels.add("M" + c.rank());
            }
            m.overlay(new MapRenderer.Overlay(MapRenderer.Overlay.Kind.MOORINGS, "mooring site (rank)", MOORING, pts, labels));
        }
        if (s.survey != null && s.survey.port != null) {
            m.overlay(new MapRenderer.Overlay(MapRenderer.Overlay.Kind.PORT, "port", PORT,
                    List.of(new double[] {s.survey.port.lonDeg, s.survey.port.latDeg}), List.of(s.survey.port.name)));
        }
    }

    private void maps() throws IOException {
        MapRenderer r = new MapRenderer();
        String period = period();
        ScalarField w = st.fields.get("ekman_pumping");
        if (w != null) {
            tick("map ekman_pumping");
            ScalarField perDay = scaled(w, 86400.0, "m day-1");
            double lim = ColorScale.robustLimit(perDay);
            MapRenderer.MapSpec m = base(perDay, "Mean Ekman pumping", period + " · positive = upward (upwelling)")
                    .scale(ColorScale.diverging(lim, "m day⁻¹", "upwelling ↑", "downwelling ↓"));
            addPlanOverlays(m);
            put("maps/ekman_pumping.png", r.renderPng(m));
        }
        VectorField tau = st.vectors.get("stress");
        ScalarField mag = st.fields.get("stress_magnitude");
        if (tau != null && mag != null) {
            tick("map wind_stress");
            double ref = niceRef(mag.range()[1]);
            MapRenderer.MapSpec m = base(mag, "Mean wind stress", period + " · drag law " + st.dragLaw.name())
                    .scale(ColorScale.sequential(0, Math.max(1e-6, ColorScale.robustLimit(mag)), "Pa"))
                    .arrows(tau, ref, "Pa");
            put("maps/wind_stress.png", r.renderPng(m));
        }
        VectorField ek = st.vectors.get("ekman_transport");
        ScalarField ekm = st.fields.get("ekman_transport_magnitude");
        if (ek != null && ekm != null) {
            tick("map ekman_transport");
            double ref = niceRef(ColorScale.robustLimit(ekm));
            MapRenderer.MapSpec m = base(ekm, "Mean Ekman transport", period + " · per unit width, right of the stress (N), left (S)")
                    .scale(ColorScale.sequential(0, Math.max(1e-9, ColorScale.robustLimit(ekm)), "m² s⁻¹"))
                    .arrows(ek, ref, "m² s⁻¹");
            put("maps/ekman_transport.png", r.renderPng(m));
        }
        ScalarField psi = st.fields.get("streamfunction");
        if (psi != null) {
            tick("map streamfunction");
            double lim = Math.max(Math.abs(psi.range()[0]), Math.abs(psi.range()[1]));
            double[] levels = Contours.niceLevels(psi, 10);
            MapRenderer.MapSpec m = base(psi, "Depth-integrated streamfunction ψ (" + s.gyre.model.name().toLowerCase(Locale.ROOT) + ")",
                    "on the mean stress · northward transport = ∂ψ/∂x · contours every " + ReportWriter.number(levels.length > 1 ? levels[1] - levels[0] : lim) + " Sv, dashed < 0")
                    .scale(ColorScale.diverging(lim > 0 ? lim : 1, "Sv", "clockwise (N) ψ > 0", "ψ < 0"))
                    .contours(psi, levels, "ψ contour (Sv)");
            put("maps/streamfunction.png", r.renderPng(m));
        }
        ScalarField pers = st.fields.get("upwelling_persistence");
        if (pers != null) {
            tick("map persistence and plan");
            ScalarField pct = scaled(pers, 100.0, "%");
            MapRenderer.MapSpec m = base(pct, "Upwelling persistence, zones and plan",
                    period + " · share of days with upward Ekman pumping")
                    .scale(ColorScale.sequential(0, 100, "% of days"));
            @SuppressWarnings("unchecked")
            List<UpwellingZone> zones = (List<UpwellingZone>) st.products.getOrDefault(Planning.ZONES, List.of());
            boolean first = true;
            for (UpwellingZone z : zones) {
                for (List<double[]> ring : rings(z.polygon())) {
                    m.overlay(new MapRenderer.Overlay(MapRenderer.Overlay.Kind.OUTLINE, first ? "upwelling zone" : null, ZONE, ring, null));
                    first = false;
                }
            }
            addPlanOverlays(m);
            put("maps/persistence_and_plan.png", r.renderPng(m));
        }
    }

    private static double niceRef(double max) {
        if (!(max > 0)) return 1;
        double mag = Math.pow(10, Math.floor(Math.log10(max)));
        double x = max / mag;
        return (x >= 5 ? 5 : x >= 2 ? 2 : 1) * mag;
    }

    private static ScalarField scaled(ScalarField f, double k, String units) {
        double[] v = f.values().clone();
        for (int i = 0; i < v.length; i++) v[i] *= k;
        return new ScalarField(f.grid(), v, f.name(), units, f.longName());
    }

    private String period() {
        if (st.times.length == 0) return "";
        return st.times[0].toString().substring(0, 10) + " to " + st.times[st.times.length - 1].toString().substring(0, 10)
                + " (" + st.times.length + " steps)";
    }

    private void put(String rel, byte[] bytes) throws IOException {
        st.out.write(rel, o -> o.write(bytes));
    }

    private static List<List<double[]>> rings(Geometry g) {
        List<List<double[]>> out = new ArrayList<>();
        for (int k = 0; k < g.getNumGeometries(); k++) {
            if (g.getGeometryN(k) instanceof Polygon p) {
                out.add(BasinGeometry.ring(p.getExteriorRing().getCoordinates()));
                for (int h = 0; h < p.getNumInteriorRing(); h++) out.add(BasinGeometry.ring(p.getInteriorRingN(h).getCoordinates()));
            }
        }
        return out;
    }

    // ------------------------------------------------------------------------------------------- charts

    private void charts() throws IOException {
        StudyPipeline.CoastSeries cm = st.coastMean;
        if (cm == null || cm.daily().size() < 2) return;
        tick("charts");
        TimeSeries d = cm.daily();
        List<LocalDate> dates = new ArrayList<>();
        for (int k = 0; k < d.size(); k++) dates.add(d.time(k).atZone(ZoneOffset.UTC).toLocalDate());
        double[] v = d.values();
        double[] clim = new double[v.length];
        MonthlyClimatology mc = cm.climatology();
        for (int k = 0; k < v.length; k++) clim[k] = mc == null ? Double.NaN : mc.mean(dates.get(k).getMonthValue());
        String where = st.coastPoints.size() == 1 ? st.coastPoints.get(0).name() : "mean of " + st.coastPoints.size() + " coast points";
        ChartRenderer cr = new ChartRenderer();
        ChartRenderer.ChartSpec c1 = new ChartRenderer.ChartSpec("Coastal upwelling index, " + where,
                "m³ s⁻¹ per 100 m of coast", dates)
                .shade(new ChartRenderer.Shade(v, clim, new Color(0x23, 0x83, 0xA8), new Color(0xC2, 0x5B, 0x21),
                        "above climatology", "below climatology"))
                .line(new ChartRenderer.Line("daily index", v, new Color(0x44, 0x44, 0x44), 0.8f))
                .line(new ChartRenderer.Line("monthly climatology", clim, Color.BLACK, 2.2f))
                .note("Positive = offshore Ekman transport (upwelling-favourable). Climatology from " + period() + ".");
        put("charts/coastal_index.png", cr.renderPng(c1));

        // cumulative index from 1 January of each year, with season dates
        double[] cum = new double[v.length];
        double acc = 0;
        for (int k = 0; k < v.length; k++) {
            if (k == 0 || dates.get(k).getYear() != dates.get(k - 1).getYear()) acc = 0;
            if (Double.isFinite(v[k])) acc += v[k];
            cum[k] = acc;
        }
        ChartRenderer.ChartSpec c2 = new ChartRenderer.ChartSpec("Cumulative upwelling index from 1 January, " + where,
                "(m³ s⁻¹ per 100 m) · day", dates)
                .line(new ChartRenderer.Line("cumulative index", cum, new Color(0x1F, 0x4E, 0x79), 2f))
                .note("Spring transition = minimum of the cumulative index; end of season = maximum (Bograd et al. 2009).")
                .breakYearly();
        for (UpwellingSeason.Season se : cm.seasons()) {
            if (!se.isResolved()) continue;
            LocalDate a = se.springTransitionDate(), b = se.endDate();
            if (a != null) c2.marker(new ChartRenderer.Marker(a, "start " + a, new Color(0x0D, 0x6E, 0x5A)));
            if (b != null) c2.marker(new ChartRenderer.Marker(b, "end " + b, new Color(0xC2, 0x5B, 0x21)));
        }
        put("charts/cumulative_index.png", cr.renderPng(c2));
    }

    // ------------------------------------------------------------------------------------------- tables

    private void csv() throws IOException {
        if (st.coastSeries.isEmpty()) return;
        tick("tables");
        List<String> header = new ArrayList<>();
        header.add("date");
        for (StudyPipeline.CoastSeries c : st.coastSeries) header.add(CsvTable.column(c.point().name(), "m3 s-1 per 100 m"));
        CsvTable daily = new CsvTable(header);
        TimeSeries first = st.coastSeries.get(0).daily();
        for (int k = 0; k < first.size(); k++) {
            Object[] row = new Object[header.size()];
            row[0] = first.time(k).atZone(ZoneOffset.UTC).toLocalDate().toString();
            for (int p = 0; p < st.coastSeries.size(); p++) {
                TimeSeries ts = st.coastSeries.get(p).daily();
                row[p + 1] = k < ts.size() ? round(ts.value(k)) : null;
            }
            daily.add(row);
        }
        st.out.writeString("tables/coastal_index_daily.csv", daily.toText());

        CsvTable points = new CsvTable(List.of("name", CsvTable.column("longitude", "degrees_east"), CsvTable.column("latitude", "degrees_north"),
                CsvTable.column("offshore_bearing", "degrees"), CsvTable.column("mean_index", "m3 s-1 per 100 m"),
                "peak_month", CsvTable.column("spring_transition", "day of year"), CsvTable.column("end_of_season", "day of year")));
        for (StudyPipeline.CoastSeries c : st.coastSeries) {
            double mean = meanOf(c.daily().values());
            double sti = Double.NaN, end = Double.NaN;
            int n = 0;
            double a = 0, b = 0;
            for (UpwellingSeason.Season se : c.seasons()) if (se.isResolved()) { a += se.springTransitionDay(); b += se.endDay(); n++; }
            if (n > 0) { sti = a / n; end = b / n; }
            points.add(c.point().name(), round(c.point().lonDeg()), round(c.point().latDeg()), round(c.point().offshoreBearingDeg()),
                    round(mean), c.climatology() == null ? null : c.climatology().maxMonth(), round(sti), round(end));
        }
        st.out.writeString("tables/coastal_index_points.csv", points.toText());

        SitingResult sr = (SitingResult) st.products.get(Planning.SITING);
        if (sr != null) {
            CsvTable m = new CsvTable(List.of("rank", "id", CsvTable.column("longitude", "degrees_east"), CsvTable.column("latitude", "degrees_north"),
                    CsvTable.column("depth", "m"), CsvTable.column("port_distance", "km"), CsvTable.column("persistence", "fraction"),
                    CsvTable.column("mean_pumping", "m day-1"), "score", "zone"));
            for (ChosenSite c : sr.sites()) {
                var k = c.candidate();
                m.add(c.rank(), k.id(), round(k.lonDeg()), round(k.latDeg()), round(k.depthM()), round(k.portDistanceKm()),
                        round(k.persistence()), round(k.meanMps() * 86400), round(c.score()), k.zoneId());
            }
            st.out.writeString("plan/moorings.csv", m.toText());
        }
        CruiseSchedule sc = (CruiseSchedule) st.products.get(Planning.SCHEDULE);
        if (sc != null) {
            CsvTable t = new CsvTable(List.of("leg", "from", "to", CsvTable.column("distance", "nmi"), CsvTable.column("transit", "h"),
                    "arrival_utc", CsvTable.column("daylight_wait", "h"), CsvTable.column("work", "h"), CsvTable.column("weather", "h"),
                    "departure_utc", CsvTable.column("elapsed", "h")));
            for (LegRow r : sc.rows()) {
                t.add(r.index(), r.fromId(), r.toId(), round(r.distanceNmi()), round(r.transitHours()), String.valueOf(r.arrival()),
                        round(r.daylightWaitHours()), round(r.workHours()), round(r.weatherHours()), String.valueOf(r.departure()), round(r.cumulativeHours()));
            }
            st.out.writeString("plan/cruise_schedule.csv", t.toText());
        }
    }

    private static Double round(double v) {
        if (!Double.isFinite(v)) return null;
        return Math.round(v * 1e4) / 1e4;
    }

    private static double meanOf(double[] v) {
        double s = 0; int n = 0;
        for (double x : v) if (Double.isFinite(x)) { s += x; n++; }
        return n > 0 ? s / n : Double.NaN;
    }

    // ------------------------------------------------------------------------------------------- gridded files

    private CfNetcdfWriter.GlobalInfo info(String what) {
        java.util.Map<String, String> extra = new java.util.LinkedHashMap<>();
        extra.put("comment", ReportWriter.CAUTION);
        extra.put("gyreplan_sign_conventions", "stress and transports toward (eastward, northward); Ekman pumping positive upward;"
                + " streamfunction in Sv with northward transport = d(psi)/dx; coastal index positive offshore");
        extra.put("gyreplan_drag_law", st.dragLaw == null ? "" : st.dragLaw.name());
        extra.put("gyreplan_rho0", Double.toString(st.constants.rho0()));
        extra.put("gyreplan_rho_air", Double.toString(st.constants.rhoAir()));
        extra.put("gyreplan_equatorial_cutoff_deg", Double.toString(st.cutoff.latitudeDeg()));
        return new CfNetcdfWriter.GlobalInfo(title() + ": " + what, "Gyreplan " + Version.current(),
                "computed by Gyreplan from " + s.winds.file + " (" + period() + ")", extra);
    }

    private static CfNetcdfWriter.FieldSpec spec(ScalarField f, String standardName) {
        return new CfNetcdfWriter.FieldSpec(f.name(), f.units(), standardName, f.longName());
    }

    private void netcdf() throws IOException {
        tick("netCDF fields");
        List<CfNetcdfWriter.FieldSpec> specs = new ArrayList<>();
        List<double[]> values = new ArrayList<>();
        VectorField tau = st.vectors.get("stress");
        if (tau != null) {
            specs.add(spec(tau.eastward(), "surface_downward_eastward_stress"));
            values.add(tau.eastward().values());
            specs.add(spec(tau.northward(), "surface_downward_northward_stress"));
            values.add(tau.northward().values());
        }
        VectorField ek = st.vectors.get("ekman_transport");
        if (ek != null) {
            specs.add(spec(ek.eastward(), null));
            values.add(ek.eastward().values());
            specs.add(spec(ek.northward(), null));
            values.add(ek.northward().values());
        }
        for (String k : List.of("stress_curl", "ekman_pumping", "upwelling_persistence", "wind_speed")) {
            ScalarField f = st.fields.get(k);
            if (f == null) continue;
            specs.add(spec(f, k.equals("wind_speed") ? "wind_speed" : null));
            values.add(f.values());
        }
        ScalarField depth = (ScalarField) st.products.get(Planning.DEPTH);
        if (depth != null) {
            specs.add(spec(depth, "sea_floor_depth_below_sea_surface"));
            values.add(depth.values());
        }
        if (!specs.isEmpty()) {
            st.out.writeFile("fields/surface_means.nc", tmp -> CfNetcdfWriter.writeGridded(tmp, st.windGrid, List.of(), specs,
                    info("time-mean wind stress, Ekman transport and pumping, upwelling persistence"), k -> values,
                    org.gyreplan.solver.progress.ProgressListener.NONE, st.cancel));
        }
        ScalarField psi = st.fields.get("streamfunction");
        if (psi != null && st.gyre != null) {
            List<CfNetcdfWriter.FieldSpec> gs = new ArrayList<>(List.of(spec(psi, "ocean_barotropic_streamfunction")));
            List<double[]> gv = new ArrayList<>(List.of(psi.values()));
            if (st.gyre.sverdrup() != null && st.gyre.sverdrup() != psi) {
                ScalarField sv = st.gyre.sverdrup();
                gs.add(new CfNetcdfWriter.FieldSpec("sverdrup_streamfunction", sv.units(), null,
                        "Sverdrup streamfunction of the interior balance, zero on the eastern coast; northward transport = d(psi)/dx"));
                gv.add(sv.values());
            }
            st.out.writeFile("fields/streamfunction.nc", tmp -> CfNetcdfWriter.writeGridded(tmp, psi.grid(), List.of(), gs,
                    info("depth-integrated streamfunction (" + s.gyre.model.name().toLowerCase(Locale.ROOT) + ")"), k -> gv,
                    org.gyreplan.solver.progress.ProgressListener.NONE, st.cancel));
        }
        if (!st.coastSeries.isEmpty()) {
            List<CfNetcdfWriter.Station> stations = new ArrayList<>();
            TimeSeries first = st.coastSeries.get(0).daily();
            List<Instant> times = new ArrayList<>();
            for (int k = 0; k < first.size(); k++) times.add(first.time(k));
            double[][] v = new double[st.coastSeries.size()][];
            for (int p = 0; p < v.length; p++) {
                StudyPipeline.CoastSeries c = st.coastSeries.get(p);
                stations.add(new CfNetcdfWriter.Station(c.point().name(), c.point().lonDeg(), c.point().latDeg()));
                double[] d = c.daily().values();
                v[p] = d.length == times.size() ? d : java.util.Arrays.copyOf(d, times.size());
            }
            CfNetcdfWriter.FieldSpec f = new CfNetcdfWriter.FieldSpec("coastal_upwelling_index", "m3 s-1 (100 m)-1", null,
                    "coastal upwelling index: cross-shore Ekman transport per 100 m of coastline, positive offshore (upwelling)");
            st.out.writeFile("series/coastal_index.nc", tmp -> CfNetcdfWriter.writeStations(tmp, stations, times, List.of(f),
                    List.<double[][]>of(v), info("daily coastal upwelling index at the index points")));
        }
    }

    private void geotiff() throws IOException {
        tick("GeoTIFF");
        for (String k : List.of("ekman_pumping", "upwelling_persistence", "streamfunction")) {
            ScalarField f = st.fields.get(k);
            if (f == null) continue;
            st.out.writeFile("fields/" + k + ".tif", tmp -> GeoTiffWriter.write(tmp, f));
        }
    }

    // ------------------------------------------------------------------------------------------- vectors

    private void vectors() throws IOException {
        tick("vector exports");
        List<FeatureLayer> layers = new ArrayList<>();
        @SuppressWarnings("unchecked")
        List<UpwellingZone> zones = (List<UpwellingZone>) st.products.getOrDefault(Planning.ZONES, List.of());
        List<Feature> zf = new ArrayList<>();
        for (UpwellingZone z : zones) {
            zf.add(Feature.of(z.polygon(), "name", "upwelling zone " + z.id(), "area_km2", round(z.areaKm2()),
                    "mean_pumping_m_per_day", round(z.meanMps() * 86400), "mean_persistence", round(z.meanPersistence()),
                    "peak_month", z.peakMonth()));
        }
        if (!zf.isEmpty()) layers.add(new FeatureLayer("upwelling_zones", zf));
        List<Feature> pf = new ArrayList<>();
        for (CoastPoint p : st.coastPoints) {
            pf.add(Feature.of(GF.createPoint(new Coordinate(p.lonDeg(), p.latDeg())), "name", p.name(),
                    "offshore_bearing_deg", round(p.offshoreBearingDeg())));
        }
        if (!pf.isEmpty()) layers.add(new FeatureLayer("coastal_index_points", pf));
        SitingResult sr = (SitingResult) st.products.get(Planning.SITING);
        List<GpxFiles.Waypoint> wpts = new ArrayList<>();
        if (sr != null && !sr.sites().isEmpty()) {
            List<Feature> mf = new ArrayList<>();
            for (ChosenSite c : sr.sites()) {
                var k = c.candidate();
                mf.add(Feature.of(GF.createPoint(new Coordinate(k.lonDeg(), k.latDeg())), "name", "M" + c.rank(),
                        "rank", c.rank(), "depth_m", round(k.depthM()), "score", round(c.score()), "caution", org.gyreplan.gisdata.vector.SeaCaution.TEXT));
                wpts.add(new GpxFiles.Waypoint("M" + c.rank(), k.lonDeg(), k.latDeg(), String.format(Locale.ROOT,
                        "mooring site rank %d, depth %.0f m. %s", c.rank(), k.depthM(), org.gyreplan.gisdata.vector.SeaCaution.TEXT)));
            }
            layers.add(new FeatureLayer("mooring_sites", mf));
        }
        Route route = (Route) st.products.get(Planning.ROUTE);
        List<GpxFiles.Route> gpxRoutes = new ArrayList<>();
        if (route != null) {
            List<double[]> track = trackPoints();
            Coordinate[] cs = new Coordinate[track.size()];
            for (int k = 0; k < cs.length; k++) cs[k] = new Coordinate(track.get(k)[0], track.get(k)[1]);
            CruiseSchedule sc = (CruiseSchedule) st.products.get(Planning.SCHEDULE);
            if (cs.length >= 2) {
                layers.add(new FeatureLayer("survey_track", List.of(Feature.of(GF.createLineString(cs), "name", "survey track",
                        "distance_nmi", round(route.totalDistanceNmi()), "days", sc == null ? null : round(sc.totalDays()),
                        "caution", org.gyreplan.gisdata.vector.SeaCaution.TEXT))));
            }
            List<Feature> sf = new ArrayList<>();
            List<GpxFiles.Waypoint> rp = new ArrayList<>();
            rp.add(new GpxFiles.Waypoint(route.port().id(), route.port().lonDeg(), route.port().latDeg(), "departure"));
            int n = 1;
            for (Stop stop : route.order()) {
                sf.add(Feature.of(GF.createPoint(new Coordinate(stop.lonDeg(), stop.latDeg())), "name", stop.id(), "order", n++,
                        "kind", stop.kind().name().toLowerCase(Locale.ROOT), "depth_m", round(stop.depthM())));
                rp.add(new GpxFiles.Waypoint(stop.id(), stop.lonDeg(), stop.latDeg(), stop.kind().name().toLowerCase(Locale.ROOT)));
            }
            rp.add(new GpxFiles.Waypoint(route.port().id(), route.port().lonDeg(), route.port().latDeg(), "return"));
            layers.add(new FeatureLayer("survey_stations", sf));
            gpxRoutes.add(new GpxFiles.Route("survey", "planned survey route. " + org.gyreplan.gisdata.vector.SeaCaution.TEXT, rp));
        }
        if (layers.isEmpty()) return;
        if (s.wants(Scenario.Output.GEOJSON)) {
            for (FeatureLayer l : layers) {
                String json = GeoJsonFiles.toJson(l);
                st.out.writeString("plan/" + l.name() + ".geojson", json);
            }
        }
        if (s.wants(Scenario.Output.KML)) {
            st.out.writeString("plan/plan.kml", KmlFiles.toXml(title(), layers));
        }
        if (s.wants(Scenario.Output.GPX) && (!wpts.isEmpty() || !gpxRoutes.isEmpty())) {
            st.out.writeString("plan/plan.gpx", GpxFiles.toXml(title(), st.times.length > 0 ? st.times[st.times.length - 1] : Instant.EPOCH, wpts, gpxRoutes));
        }
        if (s.wants(Scenario.Output.GEOPACKAGE)) {
            st.out.writeFile("plan/plan.gpkg", tmp -> GeoPackageFiles.write(tmp, layers, Instant.EPOCH));
        }
    }

    private String title() { return s.study.name == null ? "Gyreplan study" : s.study.name; }

    // ------------------------------------------------------------------------------------------- report sections

    private void sections() {
        StudyPipeline.CoastSeries cm = st.coastMean;
        if (!st.coastSeries.isEmpty()) {
            StringBuilder h = new StringBuilder();
            h.append("<p>Coastal upwelling index: cross-shore Ekman transport, positive offshore (upwelling), in m³ s⁻¹ per 100 m")
                    .append(" of coastline. Spring transition: day of the minimum of the cumulative index from 1 January; end of")
                    .append(" season: day of its maximum (Bograd et al. 2009).</p>");
            h.append("<table class=\"num\"><thead><tr><th>Point</th><th>Position</th><th>Offshore bearing</th><th>Mean index</th>")
                    .append("<th>Peak month</th><th>Year</th><th>Spring transition</th><th>End of season</th><th>Length (days)</th></tr></thead><tbody>");
            List<StudyPipeline.CoastSeries> all = new ArrayList<>(st.coastSeries);
            if (cm != null) all.add(cm);
            for (StudyPipeline.CoastSeries c : all) {
                String name = c.point() == null ? "mean of all points" : c.point().name();
                String pos = c.point() == null ? "" : String.format(Locale.ROOT, "%.2f°, %.2f°", c.point().latDeg(), c.point().lonDeg());
                String bearing = c.point() == null ? "" : String.format(Locale.ROOT, "%.0f°", c.point().offshoreBearingDeg());
                int pm = c.climatology() == null ? 0 : c.climatology().maxMonth();
                String peak = pm < 1 || pm > 12 ? "–" : java.time.Month.of(pm).getDisplayName(java.time.format.TextStyle.SHORT, Locale.ENGLISH);
                List<UpwellingSeason.Season> ss = c.seasons().isEmpty() ? List.of() : c.seasons();
                int rows = Math.max(1, ss.size());
                for (int k = 0; k < rows; k++) {
                    h.append("<tr>");
                    if (k == 0) {
                        h.append("<td rowspan=\"").append(rows).append("\">").append(ReportWriter.esc(name)).append("</td><td rowspan=\"").append(rows).append("\">")
                                .append(pos).append("</td><td rowspan=\"").append(rows).append("\">").append(bearing).append("</td><td rowspan=\"").append(rows).append("\">")
                                .append(ReportWriter.number(meanOf(c.daily().values()))).append("</td><td rowspan=\"").append(rows).append("\">").append(peak).append("</td>");
                    }
                    if (ss.isEmpty()) h.append("<td colspan=\"4\">no seasons</td>");
                    else {
                        UpwellingSeason.Season se = ss.get(k);
                        h.append("<td>").append(se.year()).append("</td>");
                        if (se.isResolved()) {
                            h.append("<td>").append(se.springTransitionDate()).append("</td><td>").append(se.endDate()).append("</td><td>")
                                    .append(ReportWriter.number(Math.round(se.lengthDays()))).append("</td>");
                        } else {
                            h.append("<td colspan=\"3\">").append(ReportWriter.esc(se.status().name().toLowerCase(Locale.ROOT).replace('_', ' ')))
                                    .append(se.reason() == null ? "" : ": " + ReportWriter.esc(se.reason())).append("</td>");
                        }
                    }
                    h.append("</tr>");
                }
            }
            h.append("</tbody></table>");
            report.section(new ReportWriter.Section("seasons", "Coastal index and seasons", h.toString()));
        }
        if (st.gyre != null && st.gyre.diagnostics() != null) {
            BoundaryCurrentDiagnostics d = st.gyre.diagnostics();
            StringBuilder h = new StringBuilder();
            h.append("<p>Model: ").append(ReportWriter.esc(s.gyre.model.name().toLowerCase(Locale.ROOT))).append(" on the time-mean stress; ψ in Sv (10⁶ m³ s⁻¹), ")
                    .append("ψ = 0 on the outer coast; northward transport = ∂ψ/∂x.</p>");
            h.append(String.format(Locale.ROOT, "<p>Largest western-boundary-current transport: <strong>%s Sv</strong> at %s°.</p>",
                    ReportWriter.number(d.peakTransportSv()), ReportWriter.number(d.peakLatitudeDeg())));
            h.append("<table class=\"num\"><thead><tr><th>Latitude</th><th>Boundary current (Sv)</th><th>Width to zero crossing (km)</th>")
                    .append("<th>e-folding width (km)</th><th>Peak speed (m/s)</th><th>Interior Sverdrup (Sv)</th><th>Net (Sv)</th></tr></thead><tbody>");
            List<BoundaryCurrentDiagnostics.Row> rows = d.rows();
            int stride = Math.max(1, rows.size() / 12);
            for (int k = 0; k < rows.size(); k += stride) {
                BoundaryCurrentDiagnostics.Row r = rows.get(k);
                h.append("<tr><td>").append(ReportWriter.number(r.latitudeDeg())).append("°</td><td>").append(ReportWriter.number(r.boundaryCurrentTransportSv()))
                        .append("</td><td>").append(ReportWriter.number(r.zeroCrossingWidthKm())).append("</td><td>").append(ReportWriter.number(r.eFoldingWidthKm()))
                        .append("</td><td>").append(ReportWriter.number(r.peakSpeedMs())).append("</td><td>").append(ReportWriter.number(r.interiorSverdrupSv()))
                        .append("</td><td>").append(ReportWriter.number(r.netTransportSv())).append("</td></tr>");
            }
            h.append("</tbody></table>");
            report.section(new ReportWriter.Section("gyre", "Gyre and boundary current", h.toString()));
        }
        SitingResult sr = (SitingResult) st.products.get(Planning.SITING);
        @SuppressWarnings("unchecked")
        List<UpwellingZone> zones = (List<UpwellingZone>) st.products.getOrDefault(Planning.ZONES, List.of());
        if (sr != null || !zones.isEmpty()) {
            StringBuilder h = new StringBuilder();
            h.append("<p class=\"caution-inline\"><strong>").append(ReportWriter.esc(ReportWriter.CAUTION)).append("</strong></p>");
            if (!zones.isEmpty()) {
                h.append("<h3>Upwelling zones</h3><table class=\"num\"><thead><tr><th>Zone</th><th>Area (km²)</th><th>Centroid</th>")
                        .append("<th>Mean pumping (m/day)</th><th>Persistence</th><th>Peak month</th></tr></thead><tbody>");
                for (UpwellingZone z : zones) {
                    h.append("<tr><td>").append(z.id()).append("</td><td>").append(ReportWriter.number(Math.round(z.areaKm2()))).append("</td><td>")
                            .append(String.format(Locale.ROOT, "%.2f°, %.2f°", z.centroidLatDeg(), z.centroidLonDeg())).append("</td><td>")
                            .append(ReportWriter.number(z.meanMps() * 86400)).append("</td><td>").append(ReportWriter.number(z.meanPersistence()))
                            .append("</td><td>").append(z.peakMonth()).append("</td></tr>");
                }
                h.append("</tbody></table>");
            }
            if (sr != null) {
                h.append("<h3>Mooring sites</h3><p>Method: ").append(ReportWriter.esc(sr.method())).append(sr.provenOptimal() ? " (proven optimal)" : "")
                        .append("; ").append(sr.feasibleCount()).append(" feasible candidates.</p>");
                h.append("<table class=\"num\"><thead><tr><th>Rank</th><th>Position</th><th>Depth (m)</th><th>Port distance (km)</th>")
                        .append("<th>Persistence</th><th>Mean pumping (m/day)</th><th>Score</th></tr></thead><tbody>");
                for (ChosenSite c : sr.sites()) {
                    var k = c.candidate();
                    h.append("<tr><td>M").append(c.rank()).append("</td><td>").append(String.format(Locale.ROOT, "%.3f°, %.3f°", k.latDeg(), k.lonDeg()))
                            .append("</td><td>").append(ReportWriter.number(Math.round(k.depthM()))).append("</td><td>").append(ReportWriter.number(Math.round(k.portDistanceKm())))
                            .append("</td><td>").append(ReportWriter.number(k.persistence())).append("</td><td>").append(ReportWriter.number(k.meanMps() * 86400))
                            .append("</td><td>").append(ReportWriter.number(c.score())).append("</td></tr>");
                }
                h.append("</tbody></table><ul>");
                for (String c : sr.cautions()) h.append("<li>").append(ReportWriter.esc(c)).append("</li>");
                h.append("</ul>");
            }
            CruiseSchedule sc = (CruiseSchedule) st.products.get(Planning.SCHEDULE);
            Route route = (Route) st.products.get(Planning.ROUTE);
            if (sc != null && route != null) {
                double cont = s.survey.weatherDowntimePercent == null ? 0 : s.survey.weatherDowntimePercent;
                h.append("<h3>Survey cruise</h3><table><tbody>")
                        .append("<tr><th>Port</th><td>").append(ReportWriter.esc(s.survey.port.name)).append("</td></tr>")
                        .append("<tr><th>Departure</th><td>").append(sc.departure()).append("</td></tr>")
                        .append("<tr><th>Stops</th><td>").append(route.order().size()).append(" (route: ").append(ReportWriter.esc(route.method())).append(")</td></tr>")
                        .append("<tr><th>Distance</th><td>").append(ReportWriter.number(sc.totalDistanceNmi())).append(" nmi</td></tr>")
                        .append("<tr><th>Transit</th><td>").append(ReportWriter.number(sc.totalTransitHours())).append(" h</td></tr>")
                        .append("<tr><th>Station work incl. weather</th><td>").append(ReportWriter.number(sc.totalStationHours()))
                        .append(" h (of which weather ").append(ReportWriter.number(sc.totalWeatherHours())).append(" h)</td></tr>")
                        .append("<tr><th>Daylight waits</th><td>").append(ReportWriter.number(sc.totalWaitHours())).append(" h</td></tr>")
                        .append("<tr><th>Total</th><td>").append(ReportWriter.number(sc.totalDays())).append(" days; with ")
                        .append(ReportWriter.number(cont)).append(" % contingency ").append(ReportWriter.number(sc.totalDays() * (1 + cont / 100)))
                        .append(" days</td></tr><tr><th>Return</th><td>").append(sc.returnTime()).append("</td></tr></tbody></table><ul>");
                for (String c : sc.cautions()) h.append("<li>").append(ReportWriter.esc(c)).append("</li>");
                for (String c : route.cautions()) h.append("<li>").append(ReportWriter.esc(c)).append("</li>");
                h.append("</ul><p>Full leg table: <code>plan/cruise_schedule.csv</code>; track: <code>plan/plan.gpx</code>, <code>plan/plan.kml</code>.</p>");
            }
            report.section(new ReportWriter.Section("plan", "Zones, moorings and survey plan", h.toString()));
        }
    }

}
