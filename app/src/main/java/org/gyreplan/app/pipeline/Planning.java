package org.gyreplan.app.pipeline;

import org.gyreplan.app.scenario.Headline;
import org.gyreplan.app.scenario.Scenario;
import org.gyreplan.gisdata.cf.BoundingBox;
import org.gyreplan.gisdata.cf.GriddedSeries;
import org.gyreplan.gisdata.cf.VariableMapping;
import org.gyreplan.gisdata.cf.VariableRole;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.plan.mooring.CandidateLattice;
import org.gyreplan.solver.plan.mooring.MooringCandidate;
import org.gyreplan.solver.plan.mooring.MooringSiting;
import org.gyreplan.solver.plan.mooring.SiteConstraints;
import org.gyreplan.solver.plan.mooring.SiteWeights;
import org.gyreplan.solver.plan.mooring.SitingResult;
import org.gyreplan.solver.plan.zones.UpwellingZone;
import org.gyreplan.solver.plan.zones.UpwellingZones;
import org.gyreplan.solver.plan.zones.ZoneThresholds;
import org.locationtech.jts.geom.Envelope;

import org.gyreplan.app.scenario.ScenarioValidator;
import org.gyreplan.solver.coast.CoastPoint;
import org.gyreplan.solver.plan.mooring.DeploymentWindows;
import org.gyreplan.solver.plan.survey.CruiseSchedule;
import org.gyreplan.solver.plan.survey.DepthModel;
import org.gyreplan.solver.plan.survey.Obstacles;
import org.gyreplan.solver.plan.survey.Route;
import org.gyreplan.solver.plan.survey.ScheduleParameters;
import org.gyreplan.solver.plan.survey.ShorePoint;
import org.gyreplan.solver.plan.survey.Stop;
import org.gyreplan.solver.plan.survey.StopKind;
import org.gyreplan.solver.plan.survey.SurveyRoute;
import org.gyreplan.solver.plan.survey.SurveyStops;
import org.gyreplan.solver.plan.survey.Transect;
import org.gyreplan.solver.plan.survey.TransectDesign;
import org.gyreplan.solver.plan.survey.Transects;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;

import java.io.IOException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

/** Planning stage: upwelling zones, bathymetry on the wind grid, ranked mooring sites. */
final class Planning {
    /** Zone thresholds: time-mean pumping ≥ 0.1 m/day upward, upward on at least half of the steps. */
    static final double ZONE_MIN_M_PER_DAY = 0.1;
    static final double ZONE_MIN_PERSISTENCE = 0.5;

    /** Product keys in {@link StudyResult#products()}. */
    static final String ZONES = "zones", SITING = "moorings", DEPTH = "depth", EXCLUSIONS = "exclusions",
            ROUTE = "route", SCHEDULE = "schedule", TRANSECTS = "transects";
    /** Deck-work wind limit for the weather model: 25 kn (common practice, CHECKS.md PL-05). */
    static final double DECK_LIMIT_MPS = 25 * 1852.0 / 3600.0;

    private static final GeometryFactory GF = new GeometryFactory();
    private final StudyPipeline.RunState st;

    Planning(StudyPipeline.RunState st) { this.st = st; }

    void run() throws StudyException {
        if (st.stats == null) return;
        st.cancel.check();
        Scenario s = st.scenario;
        st.progress.progress("planning", 0.0, "upwelling zones");
        ZoneThresholds th = ZoneThresholds.ofMetresPerDay(ZONE_MIN_M_PER_DAY, ZONE_MIN_PERSISTENCE);
        List<UpwellingZone> zones = UpwellingZones.find(st.stats, th,
                (stage, f, m) -> st.progress.progress("planning", 0.3 * Math.max(0, f), m), st.cancel);
        st.products.put(ZONES, zones);
        st.products.put(EXCLUSIONS, st.basin.exclusions());
        st.provenanceExtra.put("upwelling zones", "time-mean Ekman pumping ≥ " + ZONE_MIN_M_PER_DAY
                + " m/day upward and upward on ≥ " + (int) (100 * ZONE_MIN_PERSISTENCE) + " % of the time steps; "
                + zones.size() + " zone(s)");
        ScalarField depth = null;
        if (s.bathymetry != null) {
            depth = depthOnWindGrid(s.resolve(s.bathymetry));
            st.products.put(DEPTH, depth);
        }
        if (s.moorings != null) {
            if (depth == null) {
                st.warn(RunWarning.Kind.PRODUCT, "moorings not sited: the scenario gives no bathymetry file");
            } else {
                siting(s, zones, depth);
            }
        }
        if (s.survey != null) survey(s, zones, depth);
        st.progress.progress("planning", 1.0, zones.size() + " zones");
    }

    private void survey(Scenario s, List<UpwellingZone> zones, ScalarField depth) throws StudyException {
        st.cancel.check();
        Scenario.Survey v = s.survey;
        if (st.coastPoints.size() < 2) {
            st.warn(RunWarning.Kind.PRODUCT, "survey not planned: it needs at least two coast index points to lay transects");
            return;
        }
        st.progress.progress("planning", 0.8, "survey transects");
        List<CoastPoint> ordered = new ArrayList<>(st.coastPoints);
        ordered.sort(Comparator.comparingDouble(CoastPoint::alongCoastKm));
        double span = ordered.get(ordered.size() - 1).alongCoastKm() - ordered.get(0).alongCoastKm();
        int count = v.transectCount == null ? 4 : v.transectCount;
        double spacing = Math.max(10.0, span / Math.max(1, count - 1));
        TransectDesign design = TransectDesign.simple(spacing, count, v.transectLengthKm, v.stationSpacingKm);
        Geometry zoneUnion = null;
        if (!zones.isEmpty()) {
            List<Geometry> polys = new ArrayList<>();
            for (UpwellingZone z : zones) polys.add(z.polygon());
            zoneUnion = GF.buildGeometry(polys).union();
        }
        Envelope e = new Envelope(st.basin.envelope());
        e.expandBy(5);
        Geometry land = GF.toGeometry(e).difference(st.basin.basin());
        DepthModel dm = depth == null ? DepthModel.UNKNOWN : DepthModel.of(depth);
        List<Transect> transects;
        try {
            transects = Transects.design(ShorePoint.allOf(ordered), design, null, land, dm);
        } catch (IllegalArgumentException ex) {
            st.warn(RunWarning.Kind.PRODUCT, "survey not planned: " + ex.getMessage());
            return;
        }
        List<Stop> stops = new ArrayList<>(SurveyStops.ofTransects(transects));
        SitingResult sr = (SitingResult) st.products.get(SITING);
        if (sr != null) stops.addAll(SurveyStops.ofSites(sr.sites(), StopKind.MOORING_DEPLOYMENT));
        if (stops.isEmpty()) {
            st.warn(RunWarning.Kind.PRODUCT, "survey not planned: no station fits inside the basin");
            return;
        }
        List<Geometry> obstacles = new ArrayList<>(st.basin.exclusions());
        obstacles.add(land);
        Stop port = Stop.port(v.port.name, v.port.lonDeg, v.port.latDeg);
        st.progress.progress("planning", 0.85, "route through " + stops.size() + " stops");
        Route route;
        try {
            route = SurveyRoute.plan(port, stops, Obstacles.of(obstacles, 2.0, 5.0),
                    (stage, f, m) -> st.progress.progress("planning", 0.85 + 0.1 * Math.max(0, f), m), st.cancel);
        } catch (IllegalArgumentException ex) {
            st.warn(RunWarning.Kind.PRODUCT, "survey route not planned: " + ex.getMessage());
            return;
        }
        DeploymentWindows windows = st.portWind == null ? null
                : DeploymentWindows.of(java.util.Arrays.asList(st.times), st.portWind, DECK_LIMIT_MPS);
        ScheduleParameters base = ScheduleParameters.commonPractice();
        ScheduleParameters params = new ScheduleParameters(v.shipSpeedKnots, base.ctdDescentMpm(), base.ctdAscentMpm(),
                v.stationTimeHours * 60.0, base.bottomClearanceM(), base.maxCastDepthM(), base.mooringDeploymentHours(),
                base.mooringServiceHours(), base.daylightForMooring(), windows, windows, base.maxDowntimeFraction(),
                base.meanBadSpellHours());
        Instant departure = ScenarioValidator.parseInstant(v.start).orElse(st.times.length > 0 ? st.times[st.times.length - 1] : Instant.EPOCH);
        CruiseSchedule schedule = CruiseSchedule.of(route, params, departure);
        st.products.put(TRANSECTS, transects);
        st.products.put(ROUTE, route);
        st.products.put(SCHEDULE, schedule);
        double contingency = v.weatherDowntimePercent == null ? 0 : v.weatherDowntimePercent;
        st.headlines.put(Headline.SURVEY_DURATION, schedule.totalDays() * 24.0 * (1 + contingency / 100.0));
        st.provenanceExtra.put("survey", String.format(java.util.Locale.ROOT,
                "%d transects of %.0f km, stations every %.0f km, ship %.1f kn, %.1f h overhead per station;"
                        + " weather from the wind record near the port (deck limit 25 kn); contingency %.0f %%",
                transects.size(), v.transectLengthKm, v.stationSpacingKm, v.shipSpeedKnots, v.stationTimeHours, contingency));
    }

    private void siting(Scenario s, List<UpwellingZone> zones, ScalarField depth) {
        st.progress.progress("planning", 0.5, "mooring candidates");
        double portLon = s.survey != null && s.survey.port != null ? s.survey.port.lonDeg : Double.NaN;
        double portLat = s.survey != null && s.survey.port != null ? s.survey.port.latDeg : Double.NaN;
        List<MooringCandidate> cands = CandidateLattice.fromGrid(st.stats, zones, depth, portLon, portLat, 1,
                (stage, f, m) -> st.progress.progress("planning", 0.5 + 0.2 * Math.max(0, f), m), st.cancel);
        Scenario.Moorings m = s.moorings;
        if (m.maxDistanceFromPortKm != null && Double.isFinite(portLon)) {
            double max = m.maxDistanceFromPortKm;
            cands = cands.stream().filter(c -> !(c.portDistanceKm() > max)).toList();
        }
        SiteConstraints cons = SiteConstraints.windows(m.minDepth, m.maxDepth, 0, 1e9)
                .withSpacingKm(m.minSeparationKm == null ? 0 : m.minSeparationKm)
                .withExclusions(st.basin.exclusions());
        Map<String, Double> w = m.weights;
        SiteWeights weights = w == null ? SiteWeights.equal() : new SiteWeights(w.getOrDefault("persistence", 0.0),
                w.getOrDefault("intensity", 0.0), w.getOrDefault("variability", 0.0), w.getOrDefault("portProximity", 0.0));
        st.progress.progress("planning", 0.75, "ranking " + cands.size() + " candidates");
        SitingResult r = MooringSiting.choose(cands, cons, weights, m.count);
        st.products.put(SITING, r);
        st.headlines.put(Headline.MOORING_COUNT, (double) r.sites().size());
        if (r.sites().size() < m.count) {
            st.warn(RunWarning.Kind.PRODUCT, "only " + r.sites().size() + " of " + m.count + " moorings fit the constraints ("
                    + r.feasibleCount() + " feasible candidates; rejected: " + r.rejected() + ")");
        }
    }

    /** Sea-floor depth (m, positive down) at the wind-grid cells, from an elevation or depth file. */
    private ScalarField depthOnWindGrid(Path file) throws StudyException {
        LonLatGrid g = st.windGrid;
        Envelope e = st.basin.envelope();
        BoundingBox box = new BoundingBox(e.getMinX() - 1, e.getMaxX() + 1, Math.max(-90, e.getMinY() - 1), Math.min(90, e.getMaxY() + 1));
        ScalarField src;
        boolean isDepth;
        try {
            try (GriddedSeries b = GriddedSeries.open(file, List.of(VariableRole.ALTITUDE), VariableMapping.automatic(), box, null, null)) {
                src = b.read(0).fields().get(0);
                isDepth = false;
            } catch (IOException | IllegalArgumentException notElevation) {
                try (GriddedSeries b = GriddedSeries.open(file, List.of(VariableRole.SEA_FLOOR_DEPTH), VariableMapping.automatic(), box, null, null)) {
                    src = b.read(0).fields().get(0);
                    isDepth = true;
                }
            }
        } catch (IOException | IllegalArgumentException ex) {
            throw new StudyException(file, "bathymetry", "expected a netCDF grid of elevation (positive up) or sea-floor depth"
                    + " (positive down): " + GyreplanText.oneLine(ex), ex);
        }
        double[] d = new double[g.size()];
        for (int j = 0; j < g.ny(); j++) {
            for (int i = 0; i < g.nx(); i++) {
                int k = g.index(i, j);
                double v = src.interpolate(g.lonDeg(i), g.latDeg(j));
                d[k] = g.isOcean(k) ? (isDepth ? v : -v) : Double.NaN;
            }
        }
        st.provenanceExtra.put("bathymetry", src.grid().nx() + " × " + src.grid().ny() + " cells of " + src.grid().dLonDeg()
                + "°, " + (isDepth ? "depth" : "elevation") + " variable '" + src.name() + "'");
        return new ScalarField(g, d, "sea_floor_depth_below_sea_surface", "m", "sea-floor depth, positive down");
    }
}
