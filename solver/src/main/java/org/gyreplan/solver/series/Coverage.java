package org.gyreplan.solver.series;

/**
 * The minimum-coverage rule of an aggregate: a period's mean is accepted only if it has at least
 * {@code minCount} valid samples and at least {@code minFraction} of the samples expected in the period.
 *
 * <pre>
 *   expected = max(1, round((period end − period start) / Δt))
 *   accepted ⇔ count ≥ minCount  and  count ≥ minFraction · expected
 * </pre>
 *
 * @param minFraction        minimum fraction of expected samples, in [0, 1]
 * @param minCount           minimum number of valid samples (≥ 1)
 * @param nominalStepSeconds sampling step Δt, seconds; 0 = the series' median step
 */
public record Coverage(double minFraction, int minCount, long nominalStepSeconds) {
    /** Default rule: at least 80 % of the expected samples and at least one (a stated choice, not a standard). */
    public static final Coverage DEFAULT = new Coverage(0.8, 1, 0);
    /** Accept any period with at least one valid sample. */
    public static final Coverage ANY = new Coverage(0.0, 1, 0);

    public Coverage {
        if (!(minFraction >= 0 && minFraction <= 1)) {
            throw new IllegalArgumentException("minimum coverage fraction must be in [0, 1], got " + minFraction);
        }
        if (minCount < 1) throw new IllegalArgumentException("minimum count must be at least 1, got " + minCount);
        if (nominalStepSeconds < 0) {
            throw new IllegalArgumentException("nominal step must be ≥ 0 s (0 = inferred), got " + nominalStepSeconds);
        }
    }

    /** Samples expected in a period of the given length with the given step (seconds). */
    static int expected(long periodSeconds, long stepSeconds) {
        if (stepSeconds <= 0) return 1;
        return (int) Math.max(1, Math.round((double) periodSeconds / stepSeconds));
    }

    boolean accepts(int count, int expected) {
        return count >= minCount && count >= minFraction * expected - 1e-12;
    }
}
