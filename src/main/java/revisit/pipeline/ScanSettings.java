package revisit.pipeline;

import revisit.io.BadFramePolicy;

/**
 * Settings of the scan itself (the stages have their own records). The inlier-ratio bar of a closure is
 * {@code verification.minInlierRatio} ({@link revisit.verification.VerificationConfig}); configuration files
 * that still carry the former {@code scan.minInlierRatio} are read through {@link ConfigFile}.
 *
 * @param threads              worker threads for feature extraction, 0 = one per core; results do not depend on it
 * @param matchingNodeLevel    vocabulary level (from the root, root = 0) whose nodes restrict descriptor matching
 *                             during verification, 1..depth; default 2 (100 nodes with branching 10), a
 *                             common-practice middle ground between speed and lost matches
 * @param badFrames            what to do with an unreadable frame; default SKIP (report it and go on)
 * @param frameRateHz          frame rate assumed for image folders without timestamps, Hz, typically 1-60;
 *                             default 10 (common for mapping logs)
 * @param checkpointEveryFrames the checkpoint is forced to disk after this many frames, 1-10000; default 10, so a
 *                             crash loses at most ten frames of work
 * @param verifyTopCandidates  how many of the chosen group's best frames are verified until one passes, 1-10;
 *                             default 2 (a second try rescues a revisit whose best frame is blurred)
 * @param minScore             a verified pair becomes a closure only when its normalised retrieval score reaches
 *                             this, 0 (off) to ~10; default 0 (off); {@code tune} sets it from labelled data
 */
public record ScanSettings(int threads, int matchingNodeLevel, BadFramePolicy badFrames, double frameRateHz,
                           int checkpointEveryFrames, int verifyTopCandidates, double minScore) {

    public ScanSettings {
        if (threads < 0 || threads > 256) {
            throw new IllegalArgumentException("threads must be in [0, 256], was " + threads + "; 0 = all cores");
        }
        if (matchingNodeLevel < 1 || matchingNodeLevel > 32) {
            throw new IllegalArgumentException("matchingNodeLevel must be in [1, 32], was " + matchingNodeLevel);
        }
        if (badFrames == null) {
            throw new IllegalArgumentException("badFrames must be SKIP or STOP");
        }
        if (!(frameRateHz > 0 && frameRateHz <= 10_000)) {
            throw new IllegalArgumentException("frameRateHz must be in (0, 10000], was " + frameRateHz);
        }
        if (checkpointEveryFrames < 1 || checkpointEveryFrames > 10_000) {
            throw new IllegalArgumentException("checkpointEveryFrames must be in [1, 10000], was "
                    + checkpointEveryFrames);
        }
        if (verifyTopCandidates < 1 || verifyTopCandidates > 10) {
            throw new IllegalArgumentException("verifyTopCandidates must be in [1, 10], was " + verifyTopCandidates);
        }
        if (!(minScore >= 0 && minScore <= 1e9)) {
            throw new IllegalArgumentException("minScore must be in [0, 1e9], was " + minScore);
        }
    }

    /** The defaults documented on each field. */
    public static ScanSettings defaults() {
        return new ScanSettings(0, 2, BadFramePolicy.SKIP, 10.0, 10, 2, 0);
    }

    /** Worker threads actually used. */
    public int effectiveThreads() {
        return threads == 0 ? Runtime.getRuntime().availableProcessors() : threads;
    }

    public ScanSettings withThreads(int v) {
        return new ScanSettings(v, matchingNodeLevel, badFrames, frameRateHz, checkpointEveryFrames,
                verifyTopCandidates, minScore);
    }

    public ScanSettings withMatchingNodeLevel(int v) {
        return new ScanSettings(threads, v, badFrames, frameRateHz, checkpointEveryFrames, verifyTopCandidates,
                minScore);
    }

    public ScanSettings withBadFrames(BadFramePolicy v) {
        return new ScanSettings(threads, matchingNodeLevel, v, frameRateHz, checkpointEveryFrames,
                verifyTopCandidates, minScore);
    }

    public ScanSettings withFrameRateHz(double v) {
        return new ScanSettings(threads, matchingNodeLevel, badFrames, v, checkpointEveryFrames,
                verifyTopCandidates, minScore);
    }

    public ScanSettings withCheckpointEveryFrames(int v) {
        return new ScanSettings(threads, matchingNodeLevel, badFrames, frameRateHz, v, verifyTopCandidates,
                minScore);
    }

    public ScanSettings withMinScore(double v) {
        return new ScanSettings(threads, matchingNodeLevel, badFrames, frameRateHz, checkpointEveryFrames,
                verifyTopCandidates, v);
    }

    public ScanSettings withVerifyTopCandidates(int v) {
        return new ScanSettings(threads, matchingNodeLevel, badFrames, frameRateHz, checkpointEveryFrames, v,
                minScore);
    }
}
