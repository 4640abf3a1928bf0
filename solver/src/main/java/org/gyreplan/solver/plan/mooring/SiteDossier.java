package org.gyreplan.solver.plan.mooring;

import java.time.Month;
import java.time.format.TextStyle;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Everything a planner needs to know about one chosen site: position, depth, score with its breakdown,
 * favourable deployment months, indicative line length and cautions.
 *
 * @param site              the chosen site (position in degrees, depth in m)
 * @param weather           calm fraction per month at the site
 * @param minCalmFraction   the calm fraction a month needs to count as favourable, 0…1
 * @param deploymentMonths  favourable months 1…12
 * @param line              indicative line length
 * @param cautions          site-specific and standard cautions
 */
public record SiteDossier(ChosenSite site, DeploymentWindows weather, double minCalmFraction,
                          List<Integer> deploymentMonths, MooringLine line, List<String> cautions) {

    /**
     * @param site            chosen site
     * @param weather         wind climatology at the site for the operations limit
     * @param minCalmFraction fraction of time below the limit that makes a month favourable (e.g. 0.8)
     * @param type            mooring design
     * @param topFloatDepthM  top float depth for a taut design, m
     * @param stackHeightM    anchor/release stack height, m
     */
    public static SiteDossier of(ChosenSite site, DeploymentWindows weather, double minCalmFraction,
                                 MooringType type, double topFloatDepthM, double stackHeightM) {
        MooringCandidate c = site.candidate();
        MooringLine line = MooringLine.of(type, c.depthM(), topFloatDepthM, stackHeightM);
        List<Integer> months = weather.favourableMonths(minCalmFraction);
        List<String> cautions = new ArrayList<>();
        if (months.isEmpty()) {
            cautions.add(String.format(Locale.ROOT, "No month has the wind below %.1f m/s at least %.0f %% of the time;"
                    + " plan for weather waiting or a larger ship.", weather.limitMps(), 100 * minCalmFraction));
        }
        for (int m = 1; m <= 12; m++) {
            if (weather.samples()[m - 1] == 0) {
                cautions.add("No wind data for " + Month.of(m).getDisplayName(TextStyle.FULL, Locale.ENGLISH) + "; its weather is unknown.");
            }
        }
        if (type == MooringType.SLACK_SURFACE && c.depthM() > 6000) {
            cautions.add("Slack surface mooring deeper than 6000 m: check line weight and anchor holding.");
        }
        if (type == MooringType.TAUT_SUBSURFACE && topFloatDepthM < 30) {
            cautions.add("Top float shallower than ~30 m: exposed to ships' propellers and wave loads.");
        }
        cautions.add("Recover moorings in daylight; mooring operations usually need calmer weather than CTD work (common practice).");
        cautions.addAll(org.gyreplan.solver.plan.Cautions.STANDARD);
        return new SiteDossier(site, weather, minCalmFraction, months, line, cautions);
    }

    /** Why the site was chosen, in one line. */
    public String why() { return site.breakdown().explain(); }
}
