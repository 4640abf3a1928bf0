package org.gyreplan.solver.progress;

import java.util.concurrent.atomic.AtomicBoolean;

/** A cooperative cancel flag polled by long loops. Thread-safe. */
public final class CancelToken {
    private final AtomicBoolean cancelled = new AtomicBoolean();

    /** A token that is never cancelled (a fresh token nobody holds). */
    public static CancelToken none() { return new CancelToken(); }

    public void cancel() { cancelled.set(true); }
    public boolean isCancelled() { return cancelled.get(); }

    /** Throws {@link CancelledException} if cancellation was requested. */
    public void check() {
        if (cancelled.get()) throw new CancelledException();
    }
}
