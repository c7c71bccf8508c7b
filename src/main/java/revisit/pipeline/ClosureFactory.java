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
                  String refusal, String note) {
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
            info = toLocalPerturbation(p.information(), p.rotation());
            if (p.ambiguous() && reason.isEmpty()) {
                reason = "planar scene: a second pose fits as well";
            }
        } else if (accepted) {
            reason = "no camera file: relative pose not estimated";
        }
        if (accepted && !note.isEmpty()) {
            reason = reason.isEmpty() ? note : reason + "; " + note;
        }
        ClosureStatus status = accepted ? ClosureStatus.UNCHECKED : ClosureStatus.REJECTED;
        return new Closure(query.sequence(), query.frame(), query.time(), query.name(), match.sequence(),
                match.frame(), match.time(), match.name(), score, normalisedScore, v.inlierCount(), v.inlierRatio(),
                v.model().name().toLowerCase(Locale.ROOT), q, t, metric, info, status, reason,
                accepted ? geometricConfidence(v) : 0);
    }

    /**
     * Re-expresses the verifier's information matrix in the exported convention. The verifier perturbs
     * {@code R = exp([dtheta]x) R_hat, t = t_hat + dt} in the matched camera; the export uses the right SE(3)
     * perturbation {@code T_hat Exp(xi)}, {@code xi = (v, omega)} in the query camera (the convention of
     * pose-graph edge errors, e.g. Barfoot, State Estimation for Robotics, 2017, sec. 7.1). To first order
     * {@code dt = R v, dtheta = R omega}, so {@code I_xi = J^T I J} with {@code J = diag(R, R)}.
     */
    static double[] toLocalPerturbation(double[] info, double[] r) {
        double[] j = new double[36];
        for (int blk = 0; blk < 2; blk++) {
            for (int a = 0; a < 3; a++) {
                for (int b = 0; b < 3; b++) {
                    j[(blk * 3 + a) * 6 + blk * 3 + b] = r[a * 3 + b];
                }
            }
        }
        double[] tmp = new double[36];
        double[] out = new double[36];
        for (int a = 0; a < 6; a++) {
            for (int b = 0; b < 6; b++) {
                double sum = 0;
                for (int k = 0; k < 6; k++) {
                    sum += info[a * 6 + k] * j[k * 6 + b];
                }
                tmp[a * 6 + b] = sum;
            }
        }
        for (int a = 0; a < 6; a++) {
            for (int b = 0; b < 6; b++) {
                double sum = 0;
                for (int k = 0; k < 6; k++) {
                    sum += j[k * 6 + a] * tmp[k * 6 + b];
                }
                out[a * 6 + b] = sum;
            }
        }
        for (int a = 0; a < 6; a++) {
            for (int b = a + 1; b < 6; b++) {
                double mean = 0.5 * (out[a * 6 + b] + out[b * 6 + a]);
                out[a * 6 + b] = mean;
                out[b * 6 + a] = mean;
            }
        }
        return out;
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
