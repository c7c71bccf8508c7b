package revisit.pipeline;

import java.util.Locale;
import revisit.verification.RelativePose;
import revisit.verification.Verification;
import revisit.verification.VerificationConfig;

/** Turns a verification of (query, match) into an exported {@link Closure}. */
final class ClosureFactory {

    private final VerificationConfig config;

    ClosureFactory(VerificationConfig config) {
        this.config = config;
    }

    Closure build(FrameRecord query, FrameRecord match, double score, double normalisedScore, Verification v,
                  String refusal) {
        boolean accepted = refusal.isEmpty();
        double[] q = {0, 0, 0, 1};
        double[] t = new double[3];
        double[] info = new double[36];
        boolean metric = false;
        String reason = refusal;
        if (v.pose().isPresent()) {
            RelativePose p = v.pose().get();
            double[] wxyz = p.quaternion();
            q = new double[]{wxyz[1], wxyz[2], wxyz[3], wxyz[0]};
            if (p.metricTranslation().isPresent()) {
                t = p.metricTranslation().get().clone();
                metric = true;
            } else if (p.translationDirection().isPresent()) {
                t = p.translationDirection().get().clone();
            }
            info = p.information().clone();
            if (p.ambiguous() && reason.isEmpty()) {
                reason = "planar scene: a second pose fits as well";
            }
        } else if (accepted) {
            reason = "no camera file: relative pose not estimated";
        }
        ClosureStatus status = accepted ? ClosureStatus.UNCHECKED : ClosureStatus.REJECTED;
        return new Closure(query.sequence(), query.frame(), query.time(), query.name(), match.sequence(),
                match.frame(), match.time(), match.name(), score, normalisedScore, v.inlierCount(), v.inlierRatio(),
                v.model().name().toLowerCase(Locale.ROOT), q, t, metric, info, status, reason,
                accepted ? geometricConfidence(v) : 0);
    }

    /**
     * Confidence from geometry alone, before the consistency check: the inlier ratio, discounted when the inlier
     * count is near the minimum ({@code min(1, inliers / (2 minInliers))}). Common practice; the consistency
     * check lowers it for conflicting closures.
     */
    private double geometricConfidence(Verification v) {
        double support = Math.min(1.0, v.inlierCount() / (2.0 * config.minInliers()));
        return v.inlierRatio() * support;
    }
}
