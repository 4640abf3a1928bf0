package org.gyreplan.solver.plan.mooring;

/**
 * Indicative mooring line length from water depth and design — for a first budget of wire and rope only; the
 * mooring engineer designs the real line (tension, drag, knock-down, stretch, buoyancy).
 *
 * <pre>
 *   TAUT_SUBSURFACE:  L = H − z_top − h_stack              (scope ≈ 1.0; wire/Kevlar stretch ~1–3 %, more for nylon)
 *   SLACK_SURFACE:    L = s·H,  s = 1.1 … 1.4 (nominal 1.25) (inverse-catenary, low scope)
 * </pre>
 * H water depth (m), z_top depth of the top float (m), h_stack height of anchor + release stack (m), s scope.
 * Common practice, values from memory (CHECKS.md PL-07, PL-08); the slack design itself is described in the WHOI
 * global surface mooring description (CHECKS S23).
 *
 * @param type           design
 * @param depthM         water depth H, m
 * @param minLengthM     shortest indicative length, m
 * @param nominalLengthM nominal length, m
 * @param maxLengthM     longest indicative length, m
 * @param note           how the number was obtained
 */
public record MooringLine(MooringType type, double depthM, double minLengthM, double nominalLengthM, double maxLengthM,
                          String note) {

    /** Slack-mooring scope range and nominal (common practice, from memory). */
    public static final double SLACK_SCOPE_MIN = 1.1, SLACK_SCOPE_NOMINAL = 1.25, SLACK_SCOPE_MAX = 1.4;

    /**
     * @param type          design
     * @param depthM        water depth, m (&gt; 0)
     * @param topFloatDepthM depth of the top float for a taut subsurface mooring, m (ignored for slack surface)
     * @param stackHeightM  anchor + release stack height, m (≥ 0; ignored for slack surface)
     */
    public static MooringLine of(MooringType type, double depthM, double topFloatDepthM, double stackHeightM) {
        if (!(depthM > 0)) throw new IllegalArgumentException("mooring line: water depth must be > 0 m, got " + depthM);
        switch (type) {
            case TAUT_SUBSURFACE -> {
                if (!(topFloatDepthM >= 0) || !(stackHeightM >= 0) || topFloatDepthM + stackHeightM >= depthM) {
                    throw new IllegalArgumentException("taut mooring: top float depth " + topFloatDepthM + " m plus stack "
                            + stackHeightM + " m must be ≥ 0 and less than the water depth " + depthM + " m");
                }
                double l = depthM - topFloatDepthM - stackHeightM;
                return new MooringLine(type, depthM, l * 0.97, l, l, String.format(java.util.Locale.ROOT,
                        "taut subsurface: %.0f m depth − %.0f m top float − %.0f m anchor/release stack = %.0f m; "
                                + "cut up to ~3 %% shorter for wire/Kevlar stretch (common practice)",
                        depthM, topFloatDepthM, stackHeightM, l));
            }
            case SLACK_SURFACE -> {
                return new MooringLine(type, depthM, SLACK_SCOPE_MIN * depthM, SLACK_SCOPE_NOMINAL * depthM,
                        SLACK_SCOPE_MAX * depthM, String.format(java.util.Locale.ROOT,
                        "slack surface (inverse catenary): scope 1.1–1.4 × %.0f m depth (common practice, from memory)", depthM));
            }
            default -> throw new IllegalArgumentException("unknown mooring type " + type);
        }
    }
}
