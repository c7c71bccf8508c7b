package revisit.pipeline;

import revisit.verification.Verification;

/**
 * What checking one (query, match) pair produced: the geometric verification, possibly with a metric pose from
 * depth, and a note for the closure's reason (e.g. why no metric pose was made), empty when there is none.
 *
 * @param verification the verification
 * @param note         remark for the closure's reason field, or ""
 */
record CheckedPair(Verification verification, String note) {

    static CheckedPair of(Verification verification) {
        return new CheckedPair(verification, "");
    }
}
