package org.gyreplan.solver.gyre.mg;

import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.ForkJoinTask;
import java.util.function.IntConsumer;
import java.util.stream.IntStream;

/**
 * Deterministic data-parallel loops over fixed partitions.
 *
 * <p>Work is split into chunks whose boundaries depend only on the problem size, never on the thread count;
 * every chunk writes disjoint outputs, and reductions combine per-chunk partial results in chunk order. Hence the
 * results are bit-identical for any number of threads (including 1).
 */
public final class Parallel {
    private final int threads;
    private final ForkJoinPool pool;

    /** A sequential executor (one thread, the caller's). */
    public static final Parallel SEQUENTIAL = new Parallel(1);

    /**
     * @param threads number of worker threads (≥ 1); 1 runs everything on the calling thread
     */
    public Parallel(int threads) {
        if (threads < 1) throw new IllegalArgumentException("threads must be ≥ 1, got " + threads);
        this.threads = threads;
        this.pool = threads == 1 ? null : new ForkJoinPool(threads);
    }

    /** An executor using all available processors. */
    public static Parallel ofAvailableProcessors() {
        return new Parallel(Math.max(1, Runtime.getRuntime().availableProcessors()));
    }

    public int threads() { return threads; }

    /** Runs {@code body.accept(c)} for every chunk c in [0, nChunks); chunks must write disjoint data. */
    public void forEach(int nChunks, IntConsumer body) {
        if (pool == null || nChunks <= 1) {
            for (int c = 0; c < nChunks; c++) body.accept(c);
            return;
        }
        ForkJoinTask<?> task = pool.submit(() -> IntStream.range(0, nChunks).parallel().forEach(body));
        try {
            task.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted", e);
        } catch (java.util.concurrent.ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException re) throw re;
            if (cause instanceof Error er) throw er;
            throw new IllegalStateException(cause);
        }
    }

    /** Functional interface for a chunk reduction returning a double. */
    @FunctionalInterface
    public interface ChunkSum {
        double sum(int chunk);
    }

    /** Sum of per-chunk partial sums, added in chunk order (deterministic). */
    public double sum(int nChunks, ChunkSum body) {
        double[] partial = new double[nChunks];
        forEach(nChunks, c -> partial[c] = body.sum(c));
        double s = 0;
        for (double p : partial) s += p;
        return s;
    }

    /** Stops the worker threads (the executor stays usable sequentially afterwards is NOT guaranteed). */
    public void shutdown() {
        if (pool != null) pool.shutdown();
    }
}
