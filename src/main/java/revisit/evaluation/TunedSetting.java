package revisit.evaluation;

/**
 * The outcome of tuning: parameter values plus the acceptance threshold that reaches the target precision.
 *
 * @param setting             the chosen parameter values
 * @param acceptanceThreshold score a verified query needs to be reported; {@code +Infinity} when no threshold
 *                            reached the target precision (the detector should then report nothing)
 */
public record TunedSetting(ParameterSetting setting, double acceptanceThreshold) {
}
