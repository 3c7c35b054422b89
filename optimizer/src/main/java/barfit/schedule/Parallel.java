package barfit.schedule;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.IntFunction;

/**
 * Runs one task per beam (or per anything indexed 0..n-1) on a fixed number of threads and gives the
 * results in index order whatever the timing, so the schedule's answer never depends on the threads.
 */
final class Parallel {
    private final int threads;
    private final Progress progress;

    Parallel(int threads, Progress progress) {
        this.threads = Math.max(1, threads);
        this.progress = progress;
    }

    int threads() {
        return threads;
    }

    /** Runs {@code task} for 0..count-1, reporting each one done under {@code phase}. */
    <T> List<T> map(int count, Progress.Phase phase, IntFunction<T> task) {
        return map(count, phase, task, progress);
    }

    /** As {@link #map(int, Progress.Phase, IntFunction)}, reporting to {@code report} (quiet for small inner batches). */
    <T> List<T> map(int count, Progress.Phase phase, IntFunction<T> task, Progress report) {
        AtomicInteger done = new AtomicInteger();
        report.update(phase, 0, count);
        if (threads == 1 || count < 2) {
            List<T> results = new ArrayList<>();
            for (int i = 0; i < count; i++) {
                results.add(task.apply(i));
                report.update(phase, done.incrementAndGet(), count);
            }
            return results;
        }
        ExecutorService pool = Executors.newFixedThreadPool(Math.min(threads, count), runnable -> {
            Thread thread = new Thread(runnable, "barfit-schedule");
            thread.setDaemon(true);
            return thread;
        });
        try {
            List<Future<T>> futures = new ArrayList<>();
            for (int i = 0; i < count; i++) {
                final int index = i;
                futures.add(pool.submit(() -> {
                    T result = task.apply(index);
                    report.update(phase, done.incrementAndGet(), count);
                    return result;
                }));
            }
            List<T> results = new ArrayList<>();
            for (Future<T> future : futures) {
                results.add(future.get());
            }
            return results;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted", e);
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException cause) {
                throw cause;
            }
            throw new IllegalStateException(e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }
}
