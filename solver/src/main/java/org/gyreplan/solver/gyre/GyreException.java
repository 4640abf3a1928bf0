package org.gyreplan.solver.gyre;

/** A gyre problem the solver refuses, with a machine-readable reason and a readable message. */
public final class GyreException extends RuntimeException {
    /** Why the problem was refused. */
    public enum Reason {
        /** The mask has no ocean cell. */
        NO_OCEAN,
        /** Forcing missing or undefined on an ocean cell. */
        BAD_FORCING,
        /** Parameters out of range or missing (e.g. wall condition with A_H &gt; 0). */
        BAD_PARAMETER,
        /** Ocean too close to a pole for the spherical metrics. */
        POLAR_CELL,
        /** Islands present but the island rule cannot be applied (too many islands or a singular system). */
        ISLAND_UNSUPPORTED,
        /** The linear solver did not reach its tolerance. */
        NOT_CONVERGED
    }

    private final Reason reason;

    public GyreException(Reason reason, String message) {
        super(message);
        this.reason = reason;
    }

    public Reason reason() { return reason; }
}
