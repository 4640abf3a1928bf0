package org.gyreplan.solver.progress;

/** Thrown by long computations when their {@link CancelToken} was cancelled. */
public final class CancelledException extends RuntimeException {
    public CancelledException() { super("cancelled by the user"); }
}
