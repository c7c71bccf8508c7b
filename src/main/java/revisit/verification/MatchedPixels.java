package revisit.verification;

/**
 * Pixel positions of matched features in two frames A and B: match i joins (xA[i], yA[i]) with (xB[i], yB[i]).
 * Coordinates are pixels of the (distorted) images, pixel centres at integers. Arrays are held, not copied.
 *
 * @param xA column in frame A, pixels
 * @param yA row in frame A, pixels
 * @param xB column in frame B, pixels
 * @param yB row in frame B, pixels
 */
public record MatchedPixels(float[] xA, float[] yA, float[] xB, float[] yB) {

    public MatchedPixels {
        if (xA == null || yA == null || xB == null || yB == null) {
            throw new IllegalArgumentException("matched pixel arrays must not be null");
        }
        if (yA.length != xA.length || xB.length != xA.length || yB.length != xA.length) {
            throw new IllegalArgumentException("matched pixel arrays must have equal lengths, were " + xA.length
                    + ", " + yA.length + ", " + xB.length + ", " + yB.length);
        }
    }

    /** Number of matches. */
    public int count() {
        return xA.length;
    }
}
