package revisit.evaluation;

/**
 * Tuning on one set of sequences and the test on others.
 *
 * @param tuning  the sweep on the tuning sequences
 * @param heldOut evaluation of the chosen setting on the held-out sequences, with the acceptance threshold fixed
 *                at the tuned value (the honest estimate); its curve-wide figures (recall at 100% precision,
 *                average precision) choose their own thresholds and are optimistic
 */
public record HeldOutResult(TuningResult tuning, EvaluationResult heldOut) {
}
