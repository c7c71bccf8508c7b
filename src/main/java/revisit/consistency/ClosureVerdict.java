package revisit.consistency;

import java.util.Optional;

/**
 * The verdict on one closure.
 *
 * <p>Confidence, in [0, 1], is {@code g * s} (docs/CONSISTENCY.md):
 * {@code g = inlierRatio * (1 - exp(-inlierCount / inlierCountScale))} is the geometric support, and s the
 * consistency support: {@code (k + 1) / (k + 2)} for a CONSISTENT closure with k tested consistent partners in the
 * kept set (Laplace's rule of succession: each agreeing loop is a success), 1/2 for UNCHECKED (no evidence either
 * way), 0 for CONFLICTING.
 *
 * @param closureId         id of the closure
 * @param verdict           consistent, conflicting or unchecked
 * @param uncheckedReason   why unchecked (present exactly when the verdict is UNCHECKED)
 * @param confidence        in [0, 1], as above
 * @param consistentPartners tested partners it agrees with inside the kept set
 * @param conflictingPartners tested partners it conflicts with (anywhere)
 * @param testedPartners    all tested partners
 */
public record ClosureVerdict(String closureId, Verdict verdict, Optional<UncheckedReason> uncheckedReason,
                             double confidence, int consistentPartners, int conflictingPartners, int testedPartners) {

    public ClosureVerdict {
        if (uncheckedReason.isPresent() != (verdict == Verdict.UNCHECKED)) {
            throw new IllegalArgumentException("a reason goes with UNCHECKED and only then, verdict was " + verdict);
        }
        if (!(confidence >= 0 && confidence <= 1)) {
            throw new IllegalArgumentException("confidence must be in [0, 1], was " + confidence);
        }
    }
}
