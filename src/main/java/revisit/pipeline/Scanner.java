package revisit.pipeline;

import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import revisit.camera.CameraModel;
import revisit.index.RevisitDatabase;
import revisit.index.RevisitSearch;
import revisit.index.WordWeights;
import revisit.io.BadFrameException;
import revisit.io.BadFramePolicy;
import revisit.io.Frame;
import revisit.io.FrameSource;
import revisit.io.FrameSourceOptions;
import revisit.io.PendingFrame;
import revisit.io.FrameSources;
import revisit.io.StampedPose;
import revisit.vocabulary.Vocabulary;

/**
 * The end-to-end revisit detector: frames -> features -> words -> query -> temporal consistency -> geometric
 * verification -> closures, over one or several sequences (each later sequence is also matched against the
 * earlier ones).
 *
 * <p>Feature extraction and word lookup run on a pool of worker threads, several frames at once; everything that
 * carries state (checkpoint, database, consistency, verification) runs in frame order on the calling thread, so
 * the closures do not depend on the thread count. With a checkpoint, every processed frame is appended to it;
 * a later run with the same settings replays the recovered frames through the same deterministic steps and
 * continues where the first stopped.
 */
public final class Scanner {

    /**
     * Run options that are not tuning settings.
     *
     * @param keepRejected   also return candidates that failed verification (status REJECTED)
     * @param checkpoint     checkpoint file, or empty for none
     * @param sourceOptions  stride, frame limit and start time applied to every sequence (its frame rate is
     *                       replaced by {@link ScanSettings#frameRateHz()})
     * @param odometry       odometry trajectory per sequence name for the consistency check; empty for none
     * @param depthFolders   folder of 16-bit depth images per sequence name (docs/SCAN.md, "Metric closures");
     *                       empty for none. Needs a camera.
     * @param depthUnit      metres per stored depth unit, e.g. 0.001 for millimetres
     */
    public record Options(boolean keepRejected, Optional<Path> checkpoint, FrameSourceOptions sourceOptions,
                          Map<String, List<StampedPose>> odometry, Map<String, Path> depthFolders, double depthUnit) {

        public Options {
            odometry = Map.copyOf(odometry);
            depthFolders = Map.copyOf(depthFolders);
        }

        /** No rejected candidates, no checkpoint, every frame, no odometry, no depth. */
        public static Options defaults() {
            return new Options(false, Optional.empty(), FrameSourceOptions.defaults(), Map.of(), Map.of(), 0.001);
        }

        public Options withKeepRejected(boolean v) {
            return new Options(v, checkpoint, sourceOptions, odometry, depthFolders, depthUnit);
        }

        public Options withCheckpoint(Path v) {
            return new Options(keepRejected, Optional.of(v), sourceOptions, odometry, depthFolders, depthUnit);
        }

        public Options withSourceOptions(FrameSourceOptions v) {
            return new Options(keepRejected, checkpoint, v, odometry, depthFolders, depthUnit);
        }

        public Options withOdometry(Map<String, List<StampedPose>> v) {
            return new Options(keepRejected, checkpoint, sourceOptions, v, depthFolders, depthUnit);
        }

        public Options withDepth(Map<String, Path> folders, double unitMetres) {
            return new Options(keepRejected, checkpoint, sourceOptions, odometry, folders, unitMetres);
        }
    }

    /**
     * Frames each worker may run ahead of the in-order thread. Verification is bursty (a query with two failing
     * candidates costs 20-30 ms of CPU at 640x480, against about 12 ms of decoding and extraction per frame), so a
     * short queue leaves the workers idle during a burst; 8 per worker holds about 100 ms of their work and costs
     * about 60 KB per frame record (1000 features).
     */
    static final int FRAMES_AHEAD_PER_THREAD = 8;

    private final ScanConfig config;
    private final Vocabulary vocabulary;
    private final Optional<CameraModel> camera;
    private final Options options;

    /**
     * @param config     all settings
     * @param vocabulary the vocabulary to look words up in
     * @param camera     the camera of every frame, if calibrated (enables relative poses)
     * @param options    run options
     */
    public Scanner(ScanConfig config, Vocabulary vocabulary, Optional<CameraModel> camera, Options options) {
        if (config.scan().matchingNodeLevel() > vocabulary.depth()) {
            throw new IllegalArgumentException("matchingNodeLevel " + config.scan().matchingNodeLevel()
                    + " exceeds the vocabulary depth " + vocabulary.depth());
        }
        this.config = config;
        this.vocabulary = vocabulary;
        this.camera = camera;
        this.options = options;
    }

    /** Scans the sequences in order. */
    public ScanResult run(List<SequenceInput> inputs, ScanListener listener) {
        StageTimes times = new StageTimes();
        RevisitDatabase db = new RevisitDatabase(new WordWeights(vocabulary.wordCount(), vocabulary.weights()),
                config.index());
        QueryStep step = new QueryStep(config, new RevisitSearch(db), camera, depthFrames(inputs),
                options.keepRejected(), times);
        List<String> skipped = new ArrayList<>();
        Optional<FrameCache> cache = options.checkpoint().map(p -> FrameCache.open(p, fingerprint(inputs)));
        ExecutorService pool = Executors.newFixedThreadPool(config.scan().effectiveThreads());
        try {
            Map<Integer, Integer> lastDone = new HashMap<>();
            List<FrameRecord> recovered = cache.map(FrameCache::recovered).orElse(List.of());
            for (FrameRecord r : recovered) {
                listener.frameDone(step.handle(r), step.closures().size());
                lastDone.merge(r.sequence(), r.frame(), Math::max);
            }
            String stop = "";
            for (int s = 0; s < inputs.size() && stop.isEmpty(); s++) {
                stop = scanSequence(s, inputs.get(s), lastDone.getOrDefault(s, -1), pool, step, cache, times,
                        skipped, listener);
            }
            List<Closure> checked = ClosureChecks.apply(step.closures(),
                    inputs.stream().map(SequenceInput::name).toList(), options.odometry(), config.consistency());
            return new ScanResult(checked, markConflicts(step.traces(), checked), List.copyOf(inputs),
                    List.copyOf(skipped), times, recovered.size(), stop);
        } finally {
            pool.shutdownNow();
            cache.ifPresent(FrameCache::close);
        }
    }

    /** Traces of verified queries take the stage the consistency check gave their closure. */
    static List<QueryTrace> markConflicts(List<QueryTrace> traces, List<Closure> closures) {
        Map<Long, ClosureStatus> status = new HashMap<>();
        for (Closure c : closures) {
            if (c.status() != ClosureStatus.REJECTED) {
                status.put(((long) c.querySequence() << 32) | c.queryFrame(), c.status());
            }
        }
        List<QueryTrace> out = new ArrayList<>(traces.size());
        for (QueryTrace t : traces) {
            ClosureStatus s = status.get(((long) t.sequence() << 32) | t.frame());
            if (t.stage() != QueryStage.VERIFIED || s == null || s == ClosureStatus.TRUSTED) {
                out.add(t);
                continue;
            }
            QueryStage stage = s == ClosureStatus.CONFLICTING ? QueryStage.CONFLICTING : QueryStage.UNCHECKED;
            out.add(new QueryTrace(t.sequence(), t.frame(), t.time(), stage, t.matchSequence(), t.matchFrame(),
                    t.score(), t.inliers(), stage.name().toLowerCase(java.util.Locale.ROOT) + " by the consistency check"));
        }
        return out;
    }

    private String scanSequence(int seq, SequenceInput input, int lastDone, ExecutorService pool, QueryStep step,
                                Optional<FrameCache> cache, StageTimes times, List<String> skipped,
                                ScanListener listener) {
        FrameSourceOptions so = options.sourceOptions().withFrameRateHz(config.scan().frameRateHz());
        ThreadLocal<FrameProcessor> processors = ThreadLocal.withInitial(() -> new FrameProcessor(config.features(),
                vocabulary, config.scan().matchingNodeLevel(), times));
        int window = FRAMES_AHEAD_PER_THREAD * config.scan().effectiveThreads() + 1;
        ArrayDeque<Future<FrameRecord>> pending = new ArrayDeque<>();
        String stop = "";
        int sinceSync = 0;
        try (FrameSource source = FrameSources.open(input.path(), so)) {
            listener.sequenceStarted(seq, source.describe(), source.frameCount().orElse(-1));
            boolean exhausted = false;
            while (true) {
                while (!exhausted && pending.size() < window) {
                    Optional<PendingFrame> next;
                    try {
                        next = source.nextPending();
                    } catch (BadFrameException e) {
                        stop = skipOrStop(e, skipped, listener);
                        exhausted = !stop.isEmpty();
                        continue;
                    }
                    if (next.isEmpty()) {
                        exhausted = true;
                    } else if (next.get().index() > lastDone) {
                        PendingFrame f = next.get();
                        pending.add(pool.submit(() -> {
                            StageTimes.Mark t0 = StageTimes.mark();
                            Frame frame = f.decode();
                            times.stop(StageTimes.Stage.READ, t0);
                            return processors.get().process(seq, frame.index(), frame.timeSeconds(), frame.name(),
                                    frame.image());
                        }));
                    }
                }
                if (pending.isEmpty()) {
                    break;
                }
                FrameRecord r;
                try {
                    r = await(pending.poll());
                } catch (BadFrameException e) {
                    stop = skipOrStop(e, skipped, listener);
                    if (!stop.isEmpty()) {
                        pending.forEach(p -> p.cancel(true));
                        pending.clear();
                        exhausted = true;
                    }
                    continue;
                }
                if (cache.isPresent()) {
                    cache.get().append(r);
                    if (++sinceSync >= config.scan().checkpointEveryFrames()) {
                        cache.get().sync();
                        sinceSync = 0;
                    }
                }
                listener.frameDone(step.handle(r), step.closures().size());
            }
        }
        cache.ifPresent(FrameCache::sync);
        return stop;
    }

    /** Records a bad frame; returns its message when the policy is to stop, else "". */
    private String skipOrStop(BadFrameException e, List<String> skipped, ScanListener listener) {
        skipped.add(e.getMessage());
        listener.frameSkipped(e.getMessage());
        return config.scan().badFrames() == BadFramePolicy.STOP ? e.getMessage() : "";
    }

    private static FrameRecord await(Future<FrameRecord> f) {
        try {
            return f.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("scan interrupted", e);
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException re) {
                throw re;
            }
            throw new IllegalStateException("feature extraction failed: " + e.getCause(), e.getCause());
        }
    }

    /** The depth folders by sequence id, or empty when no depth was given. */
    private Optional<DepthFrames> depthFrames(List<SequenceInput> inputs) {
        if (options.depthFolders().isEmpty()) {
            return Optional.empty();
        }
        Map<Integer, Path> byId = new java.util.HashMap<>();
        for (int i = 0; i < inputs.size(); i++) {
            Path folder = options.depthFolders().get(inputs.get(i).name());
            if (folder != null) {
                byId.put(i, folder);
            }
        }
        return Optional.of(new DepthFrames(byId, options.depthUnit()));
    }

    /** Hash of everything that shapes a checkpoint record: inputs, feature settings, vocabulary, matching level. */
    long fingerprint(List<SequenceInput> inputs) {
        long h = 1125899906842597L;
        String text = config.features() + "|" + config.scan().matchingNodeLevel() + "|" + options.sourceOptions()
                + "|" + config.scan().frameRateHz() + "|" + vocabulary.wordCount() + "|" + vocabulary.depth();
        for (SequenceInput in : inputs) {
            text += "|" + in.path().toAbsolutePath().normalize();
        }
        for (int i = 0; i < text.length(); i++) {
            h = 31 * h + text.charAt(i);
        }
        for (double w : vocabulary.weights()) {
            h = 31 * h + Double.doubleToLongBits(w);
        }
        return h;
    }
}
