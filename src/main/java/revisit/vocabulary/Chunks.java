package revisit.vocabulary;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ForkJoinTask;
import java.util.concurrent.RecursiveTask;

/**
 * Splits a loop over {@code n} items into fixed chunks that run as fork/join tasks and returns their results in
 * chunk order. The chunk boundaries depend only on {@code n}, so combining the results in order gives the same
 * answer on any number of threads. Must be called from inside a {@code ForkJoinPool}.
 */
final class Chunks {

    /** Items per work item; below this a loop runs in the calling thread. */
    static final int SIZE = 8192;

    /** The work on items {@code lo..hi-1}. */
    @FunctionalInterface
    interface Work<T> {
        T run(int lo, int hi);
    }

    private Chunks() {
    }

    static <T> List<T> map(int n, Work<T> work) {
        if (n <= SIZE) {
            return List.of(work.run(0, n));
        }
        List<RecursiveTask<T>> tasks = new ArrayList<>();
        for (int lo = 0; lo < n; lo += SIZE) {
            int start = lo;
            int end = Math.min(n, lo + SIZE);
            tasks.add(new RecursiveTask<>() {
                @Override
                protected T compute() {
                    return work.run(start, end);
                }
            });
        }
        ForkJoinTask.invokeAll(tasks);
        List<T> results = new ArrayList<>(tasks.size());
        for (RecursiveTask<T> t : tasks) {
            results.add(t.join());
        }
        return results;
    }
}
