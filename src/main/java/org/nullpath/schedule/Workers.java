package org.nullpath.schedule;

import java.util.concurrent.Callable;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * The threads a plan computes on. With one thread every chunk of messages is computed on the calling thread
 * as it is asked for; with more, chunks are computed ahead on a fixed pool of daemon threads (an interrupted
 * run is not held up by them) and handed back in order, so the results are the same for any number of threads.
 */
public final class Workers implements AutoCloseable {
    /** Computes on the calling thread. */
    public static final Workers ONE = new Workers(1, null);

    private final int threads;
    private final ExecutorService pool;

    private Workers(int threads, ExecutorService pool) {
        this.threads = threads;
        this.pool = pool;
    }

    /** {@code threads} threads (1: the calling thread only). */
    public static Workers of(int threads) {
        if (threads < 1) {
            throw new IllegalArgumentException("at least one thread, got " + threads);
        }
        if (threads == 1) {
            return ONE;
        }
        AtomicInteger n = new AtomicInteger();
        return new Workers(threads, Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "nullpath-worker-" + n.incrementAndGet());
            t.setDaemon(true);
            return t;
        }));
    }

    /** How many threads compute. */
    public int threads() {
        return threads;
    }

    /** How many chunks may be computed ahead of the one being written (1 when computing on the calling thread). */
    private int ahead() {
        return pool == null ? 1 : 2 * threads;
    }

    /** Starts {@code work}; with one thread it is done before this returns. */
    private <T> Future<T> submit(Callable<T> work) {
        if (pool != null) {
            return pool.submit(work);
        }
        try {
            return CompletableFuture.completedFuture(work.call());
        } catch (Exception e) {
            return CompletableFuture.failedFuture(e);
        }
    }

    /**
     * Computes {@code work(1) .. work(n)} on these threads and gives each result to {@code sink} on the calling
     * thread in order (see {@link #inOrder(java.util.function.Supplier, java.util.function.Consumer)}).
     */
    public <T> void inOrder(long n, java.util.function.LongFunction<T> work, java.util.function.Consumer<T> sink) {
        long[] next = {1};
        inOrder(() -> {
            if (next[0] > n) {
                return null;
            }
            long item = next[0]++;
            return () -> work.apply(item);
        }, sink);
    }

    /**
     * Runs the pieces of work that {@code next} hands out (on the calling thread, in order; null when there are no
     * more) on these threads, up to {@link #ahead()} pieces ahead of the one handed on, and gives each result to
     * {@code sink} on the calling thread in the order handed out: the same sequence for any number of threads. A
     * failure of a piece is thrown when its turn comes (the pieces after it are cancelled).
     */
    <T> void inOrder(java.util.function.Supplier<Callable<T>> next, java.util.function.Consumer<T> sink) {
        java.util.ArrayDeque<Future<T>> pending = new java.util.ArrayDeque<>();
        try {
            Callable<T> piece = next.get();
            while (piece != null || !pending.isEmpty()) {
                while (piece != null && pending.size() < ahead()) {
                    pending.add(submit(piece));
                    piece = next.get();
                }
                sink.accept(take(pending.poll()));
            }
        } finally {
            pending.forEach(f -> f.cancel(true));
        }
    }

    /** The result of {@code f}, its failure rethrown as it was. */
    static <T> T take(Future<T> f) {
        try {
            return f.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted", e);
        } catch (java.util.concurrent.ExecutionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            if (e.getCause() instanceof Error r) {
                throw r;
            }
            throw new IllegalStateException(e.getCause());
        }
    }

    @Override
    public void close() {
        if (pool != null) {
            pool.shutdownNow();
        }
    }
}
