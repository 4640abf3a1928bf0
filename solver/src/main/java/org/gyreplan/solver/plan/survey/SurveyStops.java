package org.gyreplan.solver.plan.survey;

import org.gyreplan.solver.plan.mooring.ChosenSite;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** Turns transects and chosen mooring sites into the stops of a cruise. */
public final class SurveyStops {
    private SurveyStops() { }

    /** All stations of the transects, in transect order. */
    public static List<Stop> ofTransects(List<Transect> transects) {
        List<Stop> out = new ArrayList<>();
        for (Transect t : transects) out.addAll(t.stations());
        return out;
    }

    /** One stop per chosen site ("M1", "M2", … by rank) for deployment or service. */
    public static List<Stop> ofSites(List<ChosenSite> sites, StopKind kind) {
        if (kind != StopKind.MOORING_DEPLOYMENT && kind != StopKind.MOORING_SERVICE) {
            throw new IllegalArgumentException("mooring stops must be MOORING_DEPLOYMENT or MOORING_SERVICE, got " + kind);
        }
        List<Stop> out = new ArrayList<>();
        for (ChosenSite s : sites) {
            out.add(new Stop(String.format(Locale.ROOT, "M%d", s.rank()), s.candidate().lonDeg(), s.candidate().latDeg(),
                    s.candidate().depthM(), kind));
        }
        return out;
    }
}
