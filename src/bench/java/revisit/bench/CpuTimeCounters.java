package revisit.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import org.openjdk.jmh.annotations.AuxCounters;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * Thread CPU time spent inside the measured calls, and how many items they handled, summed per iteration. On the
 * shared machine other processes inflate wall time (our thread waits for a core); CPU time does not count those
 * waits, so {@code cpuNanos / items} is the better per-item cost there (it still includes cache misses caused by
 * other processes).
 */
@State(Scope.Thread)
@AuxCounters(AuxCounters.Type.EVENTS)
public class CpuTimeCounters {

    private static final ThreadMXBean THREADS = ManagementFactory.getThreadMXBean();

    /** CPU nanoseconds of the benchmark thread inside the measured calls. */
    public long cpuNanos;
    /** Items (descriptors) handled by the measured calls. */
    public long items;

    @Setup(Level.Iteration)
    public void clear() {
        cpuNanos = 0;
        items = 0;
    }

    static long now() {
        return THREADS.getCurrentThreadCpuTime();
    }

    void add(long startCpuNanos, int count) {
        cpuNanos += now() - startCpuNanos;
        items += count;
    }
}
