package revisit.vocabulary;

import java.util.ArrayDeque;
import java.util.Optional;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import revisit.features.FeatureConfig;
import revisit.features.FeatureExtractor;
import revisit.features.FrameFeatures;
import revisit.io.BadFrameException;
import revisit.io.Frame;
import revisit.io.FrameSource;

/**
 * Collects training descriptors from frame sources: frames are read in order on the calling thread and their
 * features extracted on {@code threads} workers (one extractor each, since an extractor is not thread-safe);
 * results are added in frame order, so the training set does not depend on the number of threads.
 */
public final class TrainingFrames implements AutoCloseable {

    /** Hears about progress and skipped frames; called on the thread that called {@link #collect}. */
    public interface Listener {
        /** @param frames frames of the current source added so far */
        void frameAdded(int frames);

        /** A frame that could not be read and was skipped. */
        void frameSkipped(BadFrameException problem);
    }

    /**
     * What one source contributed.
     *
     * @param frames      frames whose descriptors were added
     * @param badFrames   frames skipped as unreadable
     * @param descriptors descriptors added
     */
    public record Collected(int frames, int badFrames, int descriptors) {
    }

    private final ExecutorService workers;
    private final ThreadLocal<FeatureExtractor> extractors;
    private final int window;

    /**
     * @param features extractor settings
     * @param threads  extraction threads, >= 1
     */
    public TrainingFrames(FeatureConfig features, int threads) {
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be >= 1, was " + threads);
        }
        this.workers = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "revisit-training-features");
            t.setDaemon(true);
            return t;
        });
        this.extractors = ThreadLocal.withInitial(() -> new FeatureExtractor(features));
        this.window = 2 * threads;
    }

    /**
     * Adds the descriptors of every readable frame of {@code source} as one image each, until the source ends or
     * {@code set} holds {@code maxDescriptors} (the frame that reaches the cap is cut short).
     *
     * @param set modified: receives the descriptors
     */
    public Collected collect(FrameSource source, TrainingSet.Builder set, int maxDescriptors, Listener listener) {
        ArrayDeque<Future<FrameFeatures>> pending = new ArrayDeque<>();
        int before = set.count();
        int frames = 0;
        int bad = 0;
        boolean more = true;
        while (set.count() < maxDescriptors && (more || !pending.isEmpty())) {
            while (more && pending.size() < window) {
                try {
                    Optional<Frame> frame = source.next();
                    more = frame.isPresent();
                    frame.ifPresent(f -> pending.add(workers.submit(() -> extractors.get().extract(f.image()))));
                } catch (BadFrameException e) {
                    bad++;
                    listener.frameSkipped(e);
                }
            }
            if (!pending.isEmpty()) {
                FrameFeatures f = join(pending.poll());
                set.add(f.descriptors(), Math.min(f.count(), maxDescriptors - set.count()));
                listener.frameAdded(++frames);
            }
        }
        pending.forEach(f -> f.cancel(true));
        return new Collected(frames, bad, set.count() - before);
    }

    private static FrameFeatures join(Future<FrameFeatures> future) {
        try {
            return future.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while extracting training features", e);
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            throw new IllegalStateException("feature extraction failed: " + e.getCause(), e.getCause());
        }
    }

    @Override
    public void close() {
        workers.shutdownNow();
    }
}
