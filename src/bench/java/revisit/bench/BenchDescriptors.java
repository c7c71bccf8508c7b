package revisit.bench;

import java.time.Instant;
import java.util.List;
import java.util.SplittableRandom;
import revisit.features.FrameFeatures;
import revisit.vocabulary.TrainingOrigin;
import revisit.vocabulary.TrainingSet;

/** Seeded synthetic binary descriptors for the vocabulary benchmarks. */
final class BenchDescriptors {

    private BenchDescriptors() {
    }

    /**
     * {@code count} descriptors around {@code centres} random centres, each a copy of centre {@code i % centres}
     * with every bit flipped with probability {@code flipProbability}. The centres depend only on
     * {@code centreSeed}, the noise only on {@code noiseSeed}.
     */
    static long[] clustered(int centres, int count, double flipProbability, long centreSeed, long noiseSeed) {
        SplittableRandom rnd = new SplittableRandom(centreSeed);
        long[] c = new long[centres * FrameFeatures.STRIDE];
        for (int i = 0; i < c.length; i++) {
            c[i] = rnd.nextLong();
        }
        SplittableRandom noise = new SplittableRandom(noiseSeed);
        long[] d = new long[count * FrameFeatures.STRIDE];
        for (int i = 0; i < count; i++) {
            for (int w = 0; w < FrameFeatures.STRIDE; w++) {
                long flips = 0;
                for (int b = 0; b < 64; b++) {
                    if (noise.nextDouble() < flipProbability) {
                        flips |= 1L << b;
                    }
                }
                d[i * FrameFeatures.STRIDE + w] = c[(i % centres) * FrameFeatures.STRIDE + w] ^ flips;
            }
        }
        return d;
    }

    /** Groups {@code count} descriptors into images of {@code perImage}. */
    static TrainingSet set(long[] descriptors, int count, int perImage) {
        int[] starts = new int[(count + perImage - 1) / perImage];
        for (int i = 0; i < starts.length; i++) {
            starts[i] = i * perImage;
        }
        return new TrainingSet(descriptors, count, starts);
    }

    static TrainingOrigin origin() {
        return new TrainingOrigin("synthetic", List.of("synthetic"), "benchmark", Instant.EPOCH);
    }
}
