package org.gyreplan.app.desktop.study;

import org.gyreplan.app.desktop.map.MapPoint;
import org.gyreplan.app.pipeline.NamedSeries;
import org.gyreplan.app.pipeline.RunWarning;
import org.gyreplan.app.pipeline.StudyResult;
import org.gyreplan.app.scenario.Scenario;
import org.gyreplan.gisdata.basemap.LandPolygons;
import org.gyreplan.gisdata.cf.BoundingBox;
import org.gyreplan.gisdata.cf.VariableMapping;
import org.gyreplan.gisdata.raster.Bathymetry;
import org.gyreplan.gisdata.vector.PolygonFeature;
import org.gyreplan.gisdata.vector.PolygonFiles;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;
import org.gyreplan.solver.plan.mooring.ChosenSite;
import org.gyreplan.solver.plan.mooring.SitingResult;
import org.gyreplan.solver.plan.survey.CruiseSchedule;
import org.gyreplan.solver.plan.survey.Obstacles;
import org.gyreplan.solver.plan.survey.Route;
import org.gyreplan.solver.plan.survey.Stop;
import org.gyreplan.solver.plan.survey.StopKind;
import org.gyreplan.solver.plan.zones.UpwellingZone;
import org.gyreplan.solver.series.TimeSeries;
import org.gyreplan.solver.series.UpwellingSeason;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import java.time.Month;
import java.time.ZoneOffset;
import java.time.format.TextStyle;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * What the desktop shows of a scenario before a run ({@link #preview}) and of a pipeline result
 * ({@link #fromResult}). Only re-arranges what the scenario and the pipeline hold; computes no physics.
 */
public final class PipelineStudies {
    /** Field names shown first (the first match is the visible layer when the study opens). */
    private static final List<String> PREFERRED = List.of("streamfunction", "pumping", "curl", "persistence", "upwelling",
            "stress", "transport", "wind");

    private PipelineStudies() { }

    /** The scenario's geometry (basin, exclusion zones, port) for display before the run. */
    public static MapStudy preview(Scenario s) throws Exception {
        MapStudy m = new MapStudy();
        m.title = s.study != null && s.study.name != null ? s.study.name : "Study";
        m.basin = basin(s);
        m.exclusions.addAll(exclusions(s));
        if (s.survey != null && s.survey.port != null && s.survey.port.lonDeg != null) {
            m.port = new MapPoint("port", s.survey.port.name, s.survey.port.lonDeg, s.survey.port.latDeg, Double.NaN);
        }
        addLand(m);
        m.depth = depth(s, m.basin);
        m.warnings.add("Scenario loaded: run the study (Run study) to compute fields and the plan.");
        return m;
    }

    /** Natural Earth land (1:50m) as one item per polygon, so the map can skip what is out of view. */
    static void addLand(MapStudy m) {
        Geometry land = LandPolygons.load(LandPolygons.Resolution.MEDIUM_50M);
        for (int k = 0; k < land.getNumGeometries(); k++) m.land.add(land.getGeometryN(k));
    }

    /** Sea-floor depth (m, positive down, NaN on land) from the scenario's bathymetry file around the basin; or null. */
    static ScalarField depth(Scenario s, Geometry basin) throws Exception {
        if (s.bathymetry == null || basin == null) return null;
        Path file = s.resolve(s.bathymetry);
        if (!Files.isRegularFile(file)) return null;
        var e = basin.getEnvelopeInternal();
        double margin = 2;
        ScalarField elev = Bathymetry.elevation(file, new BoundingBox(e.getMinX() - margin, e.getMaxX() + margin,
                Math.max(-90, e.getMinY() - margin), Math.min(90, e.getMaxY() + margin)), VariableMapping.automatic(),
                Bathymetry.Sign.AUTO);
        double[] d = new double[elev.values().length];
        for (int k = 0; k < d.length; k++) d[k] = elev.values()[k] < 0 ? -elev.values()[k] : Double.NaN;
        return new ScalarField(elev.grid(), d, "depth", "m", "Sea-floor depth, positive down (" + file.getFileName() + ")");
    }

    /** The basin polygon of a scenario: its file, or its inline coordinates; null if neither. */
    public static Geometry basin(Scenario s) throws Exception {
        if (s.basin == null) return null;
        if (s.basin.polygon != null) {
            return PolygonFiles.readOne(s.resolve(s.basin.polygon), PolygonFiles.Options.DEFAULT, null);
        }
        if (s.basin.coordinates != null && s.basin.coordinates.size() >= 3) {
            List<double[]> ring = new ArrayList<>();
            for (List<Double> p : s.basin.coordinates) ring.add(new double[] {p.get(0), p.get(1)});
            List<List<double[]>> holes = new ArrayList<>();
            if (s.basin.islands != null) {
                for (List<List<Double>> isl : s.basin.islands) {
                    List<double[]> h = new ArrayList<>();
                    for (List<Double> p : isl) h.add(new double[] {p.get(0), p.get(1)});
                    holes.add(h);
                }
            }
            return PolygonFiles.fromLonLat(ring, holes);
        }
        return null;
    }

    /** The scenario's exclusion zones (empty if none). */
    public static List<Geometry> exclusions(Scenario s) throws Exception {
        List<Geometry> out = new ArrayList<>();
        if (s.exclusionZones != null) {
            Path p = s.resolve(s.exclusionZones);
            if (Files.isRegularFile(p)) for (PolygonFeature f : PolygonFiles.read(p)) out.add(f.polygon());
        }
        return out;
    }

    /** Everything a run produced, as map layers, charts and the editable plan. */
    public static MapStudy fromResult(StudyResult r) throws Exception {
        Scenario s = r.scenario();
        MapStudy m = preview(s);
        m.warnings.clear();
        for (RunWarning w : r.warnings()) m.warnings.add(w.toString());
        ScalarField depth = null;
        List<Map.Entry<String, ScalarField>> fields = new ArrayList<>(r.fields().entrySet());
        fields.sort(Comparator.comparingInt(e -> rank(e.getKey() + " " + e.getValue().longName())));
        for (Map.Entry<String, ScalarField> e : fields) {
            ScalarField f = e.getValue();
            String key = e.getKey().toLowerCase(Locale.ROOT);
            if (key.contains("depth") || key.contains("bathymetry")) {
                depth = f;
                continue;
            }
            if (key.contains("streamfunction") || key.equals("psi")) m.streamfunction = f;
            m.scalars.add(new MapStudy.Scalar(title(e.getKey(), f), List.of(f), signed(f)));
        }
        if (depth != null) m.depth = depth;
        else depth = m.depth;
        for (Map.Entry<String, VectorField> e : r.vectors().entrySet()) {
            m.vectors.add(new MapStudy.Vector(title(e.getKey(), e.getValue().eastward()) + " (arrows)",
                    title(e.getKey(), e.getValue().eastward()), List.of(e.getValue())));
        }
        Route route = null;
        CruiseSchedule schedule = null;
        for (Map.Entry<String, Object> e : r.products().entrySet()) {
            Object v = e.getValue();
            if (v instanceof Route x) route = x;
            else if (v instanceof CruiseSchedule x) schedule = x;
            else if (v instanceof SitingResult x) {
                for (ChosenSite c : x.sites()) {
                    m.moorings.add(new MapPoint(c.candidate().id(), c.candidate().id(), c.candidate().lonDeg(),
                            c.candidate().latDeg(), Double.NaN));
                }
            } else if (v instanceof ScalarField f) {
                String key = e.getKey().toLowerCase(Locale.ROOT);
                if (key.contains("depth") || key.contains("bathymetry")) { m.depth = f; depth = f; }
                else m.scalars.add(new MapStudy.Scalar(title(e.getKey(), f), List.of(f), signed(f)));
            } else if (v instanceof List<?> list && !list.isEmpty()) {
                if (list.get(0) instanceof UpwellingZone) {
                    for (Object o : list) m.upwellingZones.add(((UpwellingZone) o).polygon());
                } else if (list.get(0) instanceof ScalarField && list.size() > 1 && monthly(list)) {
                    List<ScalarField> frames = new ArrayList<>();
                    for (Object o : list) frames.add((ScalarField) o);
                    m.scalars.add(0, new MapStudy.Scalar(title(e.getKey(), frames.get(0)) + " (by month)", frames, signed(frames.get(0))));
                    if (m.stepLabels.isEmpty()) {
                        for (int k = 0; k < 12; k++) m.stepLabels.add(Month.of(k + 1).getDisplayName(TextStyle.FULL, Locale.ENGLISH));
                    }
                } else if (list.get(0) instanceof VectorField && list.size() > 1 && monthly(list)) {
                    List<VectorField> frames = new ArrayList<>();
                    for (Object o : list) frames.add((VectorField) o);
                    String t = title(e.getKey(), frames.get(0).eastward());
                    m.vectors.add(0, new MapStudy.Vector(t + " (by month, arrows)", t, frames));
                    if (m.stepLabels.isEmpty()) {
                        for (int k = 0; k < 12; k++) m.stepLabels.add(Month.of(k + 1).getDisplayName(TextStyle.FULL, Locale.ENGLISH));
                    }
                }
            }
        }
        if (route != null) {
            // the route's own stops are what the schedule knows: they replace the sited points when it has moorings
            if (route.order().stream().anyMatch(st -> st.kind() != StopKind.CTD_STATION)) m.moorings.clear();
            for (Stop st : route.order()) {
                MapPoint p = new MapPoint(st.id(), st.id(), st.lonDeg(), st.latDeg(), Double.NaN);
                if (st.kind() == StopKind.CTD_STATION) m.stations.add(p);
                else m.moorings.add(p);
            }
            m.port = new MapPoint("port", route.port().id(), route.port().lonDeg(), route.port().latDeg(), Double.NaN);
            if (schedule != null) m.cruise = new CruisePlan(route, schedule, Obstacles.of(m.exclusions, 2, 5), depth);
        }
        // index points; when nothing else varies in time, their monthly means drive the time slider
        java.util.TreeSet<java.time.YearMonth> months = new java.util.TreeSet<>();
        for (NamedSeries ns : r.series()) {
            if (Double.isFinite(ns.lonDeg()) && Double.isFinite(ns.latDeg())) {
                for (LocalDate d : ns.dates()) months.add(java.time.YearMonth.from(d));
            }
        }
        boolean monthlySteps = m.stepLabels.isEmpty() && months.size() > 1;
        List<java.time.YearMonth> monthList = new ArrayList<>(months);
        if (monthlySteps) {
            for (java.time.YearMonth ym : monthList) {
                m.stepLabels.add(ym.toString());
                m.stepTimes.add(ym.atDay(15).atStartOfDay().toInstant(ZoneOffset.UTC));
            }
        }
        for (NamedSeries ns : r.series()) {
            if (!Double.isFinite(ns.lonDeg()) || !Double.isFinite(ns.latDeg())) continue;
            PointSeries ps = pointSeries(ns);
            double mean = mean(ns.values());
            double[] steps = monthlySteps ? monthlyMeans(ns, monthList) : null;
            m.indexPoints.add(new MapStudy.IndexPoint(ns.name(), ns.name(), ns.lonDeg(), ns.latDeg(), mean,
                    monthlySteps ? "Monthly mean " + ns.quantity() : "Mean " + ns.quantity(), ns.units(), ps, steps));
        }
        for (Path p : r.outputFiles()) m.outputs.put(p.toString(), r.outputDir().resolve(p).toString());
        return m;
    }

    /** Charts of a point series: the values, the mean of each calendar month, and the solver's season metrics. */
    static PointSeries pointSeries(NamedSeries ns) {
        List<Instant> times = new ArrayList<>();
        long[] secs = new long[ns.dates().size()];
        for (int k = 0; k < secs.length; k++) {
            Instant t = ns.dates().get(k).atStartOfDay().toInstant(ZoneOffset.UTC);
            times.add(t);
            secs[k] = t.getEpochSecond();
        }
        double[] sum = new double[12];
        int[] n = new int[12];
        for (int k = 0; k < secs.length; k++) {
            double v = ns.values()[k];
            if (!Double.isFinite(v)) continue;
            int mo = ns.dates().get(k).getMonthValue() - 1;
            sum[mo] += v;
            n[mo]++;
        }
        double[] clim = new double[12];
        for (int k = 0; k < 12; k++) clim[k] = n[k] > 0 ? sum[k] / n[k] : Double.NaN;
        List<Instant> cumT = new ArrayList<>(), starts = new ArrayList<>(), ends = new ArrayList<>();
        List<Double> cum = new ArrayList<>();
        String cumUnits = ns.units() + " × days";
        if (secs.length > 1) {
            try {
                TimeSeries ts = new TimeSeries(ns.name(), ns.units(), secs, ns.values().clone());
                if (UpwellingSeason.isMonthly(ts)) cumUnits = ns.units() + " × months";
                for (UpwellingSeason.Season season : UpwellingSeason.perYear(ts, UpwellingSeason.Options.DEFAULT)) {
                    if (season.cumulative() != null) {
                        for (int k = 0; k < season.cumulative().length; k++) {
                            double day = season.cumulativeDays()[k];
                            cumT.add(LocalDate.ofYearDay(season.year(), 1).atStartOfDay().toInstant(ZoneOffset.UTC)
                                    .plusSeconds(Math.round((day - 1) * 86400)));
                            cum.add(season.cumulative()[k]);
                        }
                    }
                    if (season.isResolved()) {
                        LocalDate a = season.springTransitionDate(), b = season.endDate();
                        if (a != null) starts.add(a.atStartOfDay().toInstant(ZoneOffset.UTC));
                        if (b != null) ends.add(b.atStartOfDay().toInstant(ZoneOffset.UTC));
                    }
                }
            } catch (RuntimeException ex) {
                cumT.clear();
                cum.clear();
            }
        }
        // keep the cumulative instants strictly increasing (one curve per year, joined)
        List<Instant> ct = new ArrayList<>();
        List<Double> cv = new ArrayList<>();
        for (int k = 0; k < cumT.size(); k++) {
            if (ct.isEmpty() || cumT.get(k).isAfter(ct.get(ct.size() - 1))) { ct.add(cumT.get(k)); cv.add(cum.get(k)); }
        }
        return new PointSeries(ns.quantity(), ns.units(), times, ns.values().clone(), clim, ct,
                cv.stream().mapToDouble(Double::doubleValue).toArray(), cumUnits, starts, ends);
    }

    /** Mean of a series in each of the given months (NaN where it has no value). */
    static double[] monthlyMeans(NamedSeries ns, List<java.time.YearMonth> months) {
        java.util.Map<java.time.YearMonth, Integer> at = new java.util.HashMap<>();
        for (int k = 0; k < months.size(); k++) at.put(months.get(k), k);
        double[] sum = new double[months.size()];
        int[] n = new int[months.size()];
        for (int k = 0; k < ns.values().length; k++) {
            double v = ns.values()[k];
            Integer q = at.get(java.time.YearMonth.from(ns.dates().get(k)));
            if (q != null && Double.isFinite(v)) { sum[q] += v; n[q]++; }
        }
        double[] out = new double[months.size()];
        for (int k = 0; k < out.length; k++) out[k] = n[k] > 0 ? sum[k] / n[k] : Double.NaN;
        return out;
    }

    private static boolean monthly(List<?> l) { return l.size() == 12; }

    private static int rank(String name) {
        String n = name.toLowerCase(Locale.ROOT);
        for (int k = 0; k < PREFERRED.size(); k++) if (n.contains(PREFERRED.get(k))) return k;
        return PREFERRED.size();
    }

    private static boolean signed(ScalarField f) {
        double[] r = f.range();
        return r[0] < 0 && r[1] > 0;
    }

    /** A short layer title from the result's key ("ekman_pumping" → "Ekman pumping"). */
    private static String title(String key, ScalarField f) {
        String t = key.replace('_', ' ').trim();
        if (t.isEmpty()) t = f.name();
        t = t.replace("ekman", "Ekman").replace("sverdrup", "Sverdrup").replace("stommel", "Stommel").replace("munk", "Munk");
        return Character.toUpperCase(t.charAt(0)) + t.substring(1);
    }

    private static double mean(double[] v) {
        double s = 0;
        int n = 0;
        for (double x : v) if (Double.isFinite(x)) { s += x; n++; }
        return n > 0 ? s / n : Double.NaN;
    }

    /** A closed lon/lat ring from a JTS polygon's exterior, as scenario coordinates. */
    public static List<List<Double>> ring(Geometry polygon) {
        List<List<Double>> out = new ArrayList<>();
        Geometry g = polygon.getNumGeometries() > 1 ? polygon.getGeometryN(0) : polygon;
        Coordinate[] cs = ((org.locationtech.jts.geom.Polygon) g).getExteriorRing().getCoordinates();
        for (Coordinate c : cs) out.add(List.of(c.x, c.y));
        return out;
    }

}
