package org.gyreplan.app.desktop.study;

import org.gyreplan.app.desktop.SyntheticStudy;
import org.gyreplan.solver.plan.survey.LegRow;
import org.gyreplan.solver.plan.survey.Stop;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Moving a stop of the editable cruise re-sails its two legs only and re-reads the depth there. */
class CruisePlanTest {

    @Test
    void movingAStationChangesOnlyItsTwoLegs() {
        MapStudy s = SyntheticStudy.build();
        CruisePlan plan = s.cruise;
        List<LegRow> before = plan.schedule().rows();
        plan.move("S3", -27.3, 26.0);
        List<LegRow> after = plan.schedule().rows();
        assertEquals(before.size(), after.size(), "same number of legs, order kept");
        for (int k = 0; k < after.size(); k++) {
            LegRow a = before.get(k), b = after.get(k);
            boolean touches = b.toId().equals("S3") || b.fromId().equals("S3");
            if (!touches) assertEquals(a.distanceNmi(), b.distanceNmi(), 1e-9, "leg " + b.fromId() + "→" + b.toId());
        }
        // S2 (−24, 28) → S3 (−27.3, 26): haversine on a 6371 km sphere (Sinnott 1984); ellipsoid vs sphere < 0.6 %
        LegRow toS3 = after.stream().filter(r -> r.toId().equals("S3")).findFirst().orElseThrow();
        double nmi = SyntheticStudy.haversineKm(28, -24, 26, -27.3) / 1.852;
        assertEquals(nmi, toS3.distanceNmi(), 0.006 * nmi);
        Stop s3 = plan.stops().stream().filter(x -> x.id().equals("S3")).findFirst().orElseThrow();
        assertEquals(SyntheticStudy.depthAt(-27.5), s3.depthM(), 1e-9, "depth of the cell centred at 27.5° W");
        assertTrue(plan.rows().get(0).leg().contains("→"));
    }

    @Test
    void unknownStopIsRefusedByName() {
        var ex = assertThrows(IllegalArgumentException.class, () -> SyntheticStudy.build().cruise.move("X9", 0, 0));
        assertTrue(ex.getMessage().contains("X9"));
    }
}
