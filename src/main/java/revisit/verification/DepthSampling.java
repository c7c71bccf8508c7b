package revisit.verification;

/** How a depth image is read at a sub-pixel position. */
public enum DepthSampling {
    /** The pixel whose centre is nearest; 0 (no measurement) stays invalid. */
    NEAREST,
    /**
     * Bilinear blend of the four surrounding pixels when all four are valid and within a relative jump of each
     * other; at a depth edge (jump exceeded) the nearest valid pixel is used instead, so that no phantom depth
     * between foreground and background is invented; with any of the four missing, the nearest pixel is used if valid.
     */
    BILINEAR
}
