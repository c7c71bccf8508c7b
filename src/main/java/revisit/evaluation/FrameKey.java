package revisit.evaluation;

import java.util.regex.Pattern;

/**
 * One frame of one sequence: the unit that queries, matches and labels refer to.
 *
 * @param sequenceId name of the sequence (letters, digits, '_', '.', '-'; never blank)
 * @param frame      frame number within the sequence, counted from 0
 */
public record FrameKey(String sequenceId, int frame) {

    private static final Pattern ID = Pattern.compile("[A-Za-z0-9_.\\-]+");

    public FrameKey {
        requireValidSequenceId(sequenceId);
        if (frame < 0) {
            throw new IllegalArgumentException("frame number must be >= 0, was " + frame);
        }
    }

    /**
     * Checks a sequence id: letters, digits, '_', '.', '-' only, so that it can be written in text files.
     *
     * @throws IllegalArgumentException when the id is null, blank or holds other characters
     */
    static String requireValidSequenceId(String sequenceId) {
        if (sequenceId == null || !ID.matcher(sequenceId).matches()) {
            throw new IllegalArgumentException("sequence id '" + sequenceId
                    + "' must be letters, digits, '_', '.' or '-' and not blank");
        }
        return sequenceId;
    }

    @Override
    public String toString() {
        return sequenceId + ":" + frame;
    }
}
