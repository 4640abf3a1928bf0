package org.gyreplan.solver.plan.mooring;

import net.sf.geographiclib.Geodesic;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;

import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.*;

class MooringSitingTest {
    private static final GeometryFactory GF = new GeometryFactory();

    static Geometry box(double w, double s, double e, double n) {
        return GF.createPolygon(new Coordinate[] {new Coordinate(w, s), new Coordinate(e, s), new Coordinate(e, n),
                new Coordinate(w, n), new Coordinate(w, s)});
    }

    static List<MooringCandidate> randomCandidates(Random rnd, int n) {
        List<MooringCandidate> c = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            c.add(new MooringCandidate("c" + i, -20 + 2 * rnd.nextDouble(), 25 + 2 * rnd.nextDouble(),
                    rnd.nextDouble() < 0.1 ? Double.NaN : 50 + 4000 * rnd.nextDouble(), 200 * rnd.nextDouble(),
                    50 + 300 * rnd.nextDouble(), rnd.nextDouble(), 1e-6 * rnd.nextGaussian(), 1e-6 * rnd.nextDouble(),
                    rnd.nextDouble() < 0.7 ? 1 : 0));
        }
        return c;
    }

    /** Property: every chosen set respects every constraint, on 60 seeded random cases; the set is maximal. */
    @Test
    void chosenSitesRespectEveryConstraint() {
        for (int seed = 100; seed < 160; seed++) {
            Random rnd = new Random(seed);
            List<MooringCandidate> cands = randomCandidates(rnd, 20 + rnd.nextInt(60));
            double minD = 100 + 500 * rnd.nextDouble(), maxD = minD + 500 + 3000 * rnd.nextDouble();
            double minC = 10 * rnd.nextDouble(), maxC = minC + 50 + 150 * rnd.nextDouble();
            List<Geometry> excl = List.of(box(-19.5, 25.5, -19.0 + rnd.nextDouble(), 26.0 + rnd.nextDouble()));
            double spacing = 10 + 60 * rnd.nextDouble();
            SiteConstraints k = new SiteConstraints(minD, maxD, minC, maxC, excl, spacing, rnd.nextBoolean());
            int kk = 1 + rnd.nextInt(6);
            SitingResult r = MooringSiting.choose(cands, k, new SiteWeights(rnd.nextDouble(), rnd.nextDouble(),
                    rnd.nextDouble(), 0.1 + rnd.nextDouble()), kk);
            assertTrue(r.sites().size() <= kk);
            Set<String> chosen = new HashSet<>();
            for (ChosenSite s : r.sites()) {
                MooringCandidate c = s.candidate();
                chosen.add(c.id());
                assertTrue(c.depthM() >= minD && c.depthM() <= maxD, "seed " + seed + " depth window");
                assertTrue(c.coastDistanceKm() >= minC && c.coastDistanceKm() <= maxC, "seed " + seed + " coast window");
                assertFalse(excl.get(0).intersects(GF.createPoint(new Coordinate(c.lonDeg(), c.latDeg()))), "seed " + seed + " exclusion");
                if (k.requireInZone()) assertTrue(c.zoneId() > 0);
                assertTrue(s.score() >= 0 && s.score() <= 1 + 1e-12);
            }
            for (ChosenSite a : r.sites()) for (ChosenSite b : r.sites()) {
                if (a == b) continue;
                // reference: GeographicLib inverse on WGS 84 (Karney 2013)
                double d = Geodesic.WGS84.Inverse(a.candidate().latDeg(), a.candidate().lonDeg(),
                        b.candidate().latDeg(), b.candidate().lonDeg()).s12 / 1000;
                assertTrue(d >= spacing, "seed " + seed + ": sites " + d + " km apart < " + spacing);
            }
            // maximality: if fewer than K were chosen, every other feasible candidate is too close to a chosen one
            if (r.sites().size() < kk) {
                for (MooringCandidate c : cands) {
                    if (chosen.contains(c.id()) || MooringSiting.rejection(c, k, List.of(
                            org.locationtech.jts.geom.prep.PreparedGeometryFactory.prepare(excl.get(0)))) != null) continue;
                    boolean close = false;
                    for (ChosenSite s : r.sites()) {
                        double d = Geodesic.WGS84.Inverse(c.latDeg(), c.lonDeg(), s.candidate().latDeg(), s.candidate().lonDeg()).s12 / 1000;
                        if (d < spacing) close = true;
                    }
                    assertTrue(close, "seed " + seed + ": feasible candidate " + c.id() + " could have been added");
                }
            }
            assertTrue(r.totalScore() >= r.greedyTotalScore() - 1e-12 || r.sites().size() > r.greedyCount());
            assertEquals(1.0, r.weights().persistence() + r.weights().intensity() + r.weights().variability()
                    + r.weights().portProximity(), 1e-12);
        }
    }

    /** Hand-worked normalisation: three candidates, weights (2, 1, 0, 1) → normalised (0.5, 0.25, 0, 0.25). */
    @Test
    void scoreBreakdownHandWorked() {
        List<MooringCandidate> c = List.of(
                new MooringCandidate("a", 0, 30, 1000, 50, 100, 0.9, 2e-6, 1e-6, 1),
                new MooringCandidate("b", 1, 30, 1000, 50, 200, 0.5, 4e-6, 1e-6, 1),
                new MooringCandidate("c", 2, 30, 1000, 50, 300, 0.7, 3e-6, 1e-6, 1));
        SitingResult r = MooringSiting.choose(c, SiteConstraints.windows(0, 5000, 0, 500), new SiteWeights(2, 1, 0, 1), 1);
        // a: persistence 1, intensity 0, variability 1 (constant), port 1 → 0.5 + 0 + 0 + 0.25 = 0.75
        // b: 0, 1, 1, 0 → 0.25; c: 0.5, 0.5, 1, 0.5 → 0.25 + 0.125 + 0.125 = 0.5
        assertEquals(1, r.sites().size());
        ChosenSite s = r.sites().get(0);
        assertEquals("a", s.candidate().id());
        assertEquals(0.75, s.score(), 1e-12);
        assertEquals(1.0, s.breakdown().persistenceNorm(), 0);
        assertEquals(0.0, s.breakdown().intensityNorm(), 0);
        assertEquals(1.0, s.breakdown().portProximityNorm(), 0);
        assertTrue(s.breakdown().explain().startsWith("score 0.750"));
        assertTrue(r.provenOptimal());
        assertTrue(r.cautions().stream().anyMatch(x -> x.startsWith("Not for navigation")));
    }

    @Test
    void rejectionsAreCountedByReason() {
        List<MooringCandidate> c = List.of(
                new MooringCandidate("land", 0, 30, Double.NaN, 0, 10, 1, 1e-6, 0, 1),
                new MooringCandidate("shallow", 0, 30, 20, 10, 10, 1, 1e-6, 0, 1),
                new MooringCandidate("ok", 0, 30, 2000, 10, 10, 1, 1e-6, 0, 1));
        SitingResult r = MooringSiting.choose(c, SiteConstraints.windows(100, 5000, 0, 500), SiteWeights.equal(), 3);
        assertEquals(1, r.feasibleCount());
        assertEquals(1, r.rejected().get("depth unknown (land or no data)"));
        assertEquals(1, r.rejected().get("shallower than 100.0 m"));
        assertTrue(r.cautions().stream().anyMatch(x -> x.startsWith("Only 1 of the 3")));
    }

    /** Line length rules of thumb, common practice (CHECKS PL-07 taut ≈ depth − top float − stack; PL-08 slack 1.1–1.4 × depth). */
    @Test
    void mooringLineRulesOfThumb() {
        MooringLine taut = MooringLine.of(MooringType.TAUT_SUBSURFACE, 4000, 50, 10);
        assertEquals(3940.0, taut.nominalLengthM(), 1e-9);
        assertEquals(3940.0 * 0.97, taut.minLengthM(), 1e-9);
        MooringLine slack = MooringLine.of(MooringType.SLACK_SURFACE, 4000, 0, 0);
        assertEquals(4400.0, slack.minLengthM(), 1e-9);
        assertEquals(5600.0, slack.maxLengthM(), 1e-9);
        assertEquals(5000.0, slack.nominalLengthM(), 1e-9);
        assertThrows(IllegalArgumentException.class, () -> MooringLine.of(MooringType.TAUT_SUBSURFACE, 40, 50, 0));
    }

    /** Hand-counted calm fractions and favourable months. */
    @Test
    void deploymentWindowsFromWindSeries() {
        List<Instant> t = new ArrayList<>();
        List<Double> u = new ArrayList<>();
        LocalDate d = LocalDate.of(2019, 1, 1);
        while (d.getYear() == 2019) {
            t.add(d.atStartOfDay().toInstant(ZoneOffset.UTC));
            // winter months windy: 14 m/s on every second day Nov–Mar, else 6 m/s
            boolean winter = d.getMonthValue() <= 3 || d.getMonthValue() >= 11;
            u.add(winter && d.getDayOfMonth() % 2 == 0 ? 14.0 : 6.0);
            d = d.plusDays(1);
        }
        DeploymentWindows w = DeploymentWindows.of(t, u.stream().mapToDouble(Double::doubleValue).toArray(), 12.0);
        assertEquals(16.0 / 31.0, w.calmFraction(1), 1e-15);   // Jan: 15 even days windy → 16 calm of 31
        assertEquals(14.0 / 28.0, w.calmFraction(2), 1e-15);
        assertEquals(1.0, w.calmFraction(7), 0);
        assertEquals(List.of(4, 5, 6, 7, 8, 9, 10), w.favourableMonths(0.8));
        ChosenSite s = new ChosenSite(1, new MooringCandidate("x", 0, 30, 3000, 50, 100, 1, 1e-6, 1e-7, 1),
                new ScoreBreakdown(1, 1, 1, 1, SiteWeights.equal().normalised(), 1));
        SiteDossier dossier = SiteDossier.of(s, w, 0.8, MooringType.TAUT_SUBSURFACE, 100, 10);
        assertEquals(List.of(4, 5, 6, 7, 8, 9, 10), dossier.deploymentMonths());
        assertEquals(2890.0, dossier.line().nominalLengthM(), 1e-9);
        assertFalse(dossier.cautions().isEmpty());
    }
}
