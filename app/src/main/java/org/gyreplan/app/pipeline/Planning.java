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

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

/** Planning stage: upwelling zones, bathymetry on the wind grid, ranked mooring sites. */
final class Planning {
    /** Zone thresholds: time-mean pumping ≥ 0.1 m/day upward, upward on at least half of the steps. */
    static final double ZONE_MIN_M_PER_DAY = 0.1;
    static final double ZONE_MIN_PERSISTENCE = 0.5;

    /** Product keys in {@link StudyResult#products()}. */
    static final String ZONES = "zones", SITING = "moorings", DEPTH = "depth", EXCLUSIONS = "exclusions";

    private final StudyPipeline.RunState st;

    Planning(StudyPipeline.RunState st) { this.st = st; }

    void run() throws StudyException {
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
        st.progress.progress("planning", 1.0, zones.size() + " zones");
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
