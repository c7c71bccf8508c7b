package revisit.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;

/**
 * Add and query cost and memory of one retrieval system as its database grows through the given sizes of
 * synthetic frames ({@link DescriptorFrames}). At each size: the thread CPU time of every add since the last size,
 * then {@code queries} queries (half revisits of random stored frames, half new places) timed over
 * {@code rounds} rounds after one warm-up round (thread CPU and wall time), the share of revisit queries whose
 * first hit is the revisited frame, and the retained bytes. Frame generation is outside every timed call.
 */
final class RetrievalScale {

    /** Figures at one database size; times in microseconds. */
    record Point(String system, int frames, double addCpuMeanUs, double addWallMeanUs, double queryCpuP50Us,
                 double queryCpuP99Us, double queryWallP50Us, double queryWallP99Us, long retainedBytes,
                 double revisitTop1) {
    }

    private static final ThreadMXBean CPU = ManagementFactory.getThreadMXBean();
    private static final int LIMIT = 50;

    private RetrievalScale() {
    }

    static List<Point> run(RetrievalSystem system, DescriptorFrames generator, int[] sizes, int queries, int rounds,
                           double keep) {
        List<Point> points = new ArrayList<>();
        int added = 0;
        for (int size : sizes) {
            long addCpu = 0;
            long addWall = 0;
            int count = size - added;
            while (added < size) {
                DescriptorFrame f = generator.frame(added);
                long c0 = CPU.getCurrentThreadCpuTime();
                long w0 = System.nanoTime();
                system.add(f);
                addWall += System.nanoTime() - w0;
                addCpu += CPU.getCurrentThreadCpuTime() - c0;
                added++;
            }
            int[] originals = new int[queries];
            DescriptorFrame[] batch = new DescriptorFrame[queries];
            SplittableRandom pick = new SplittableRandom(size);
            for (int q = 0; q < queries; q++) {
                originals[q] = q % 2 == 0 ? pick.nextInt(size) : -1;
                batch[q] = generator.query(q, originals[q], keep);
            }
            Timed timed = timeQueries(system, batch, originals, rounds);
            points.add(new Point(system.name(), size, addCpu / 1e3 / count, addWall / 1e3 / count,
                    percentile(timed.cpu, 0.5), percentile(timed.cpu, 0.99), percentile(timed.wall, 0.5),
                    percentile(timed.wall, 0.99), system.retainedBytes(), timed.revisitTop1));
        }
        return points;
    }

    private record Timed(long[] cpu, long[] wall, double revisitTop1) {
    }

    private static Timed timeQueries(RetrievalSystem system, DescriptorFrame[] batch, int[] originals, int rounds) {
        int n = batch.length;
        long[] cpu = new long[n * rounds];
        long[] wall = new long[n * rounds];
        int revisits = 0;
        int found = 0;
        for (int round = -1; round < rounds; round++) {
            for (int q = 0; q < n; q++) {
                long c0 = CPU.getCurrentThreadCpuTime();
                long w0 = System.nanoTime();
                List<RetrievalSystem.Hit> hits = system.query(batch[q], LIMIT);
                long w1 = System.nanoTime();
                long c1 = CPU.getCurrentThreadCpuTime();
                if (round < 0) {
                    continue;
                }
                cpu[round * n + q] = c1 - c0;
                wall[round * n + q] = w1 - w0;
                if (round == 0 && originals[q] >= 0) {
                    revisits++;
                    found += !hits.isEmpty() && hits.get(0).frame() == originals[q] ? 1 : 0;
                }
            }
        }
        return new Timed(cpu, wall, revisits == 0 ? 0 : found / (double) revisits);
    }

    static double percentile(long[] nanos, double p) {
        long[] sorted = nanos.clone();
        Arrays.sort(sorted);
        return sorted[(int) Math.min(sorted.length - 1, Math.floor(p * sorted.length))] / 1e3;
    }
}
