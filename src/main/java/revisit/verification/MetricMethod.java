package revisit.verification;

/** Which measurements produced a metric relative pose. */
public enum MetricMethod {
    /** Depth in both frames: 3D-3D alignment (Umeyama) in RANSAC, refined on whitened 3D residuals. */
    DEPTH_IN_BOTH,
    /** Depth in frame A only: perspective-n-point (BoofCV P3P, EPnP) in RANSAC, refined on reprojection error in B. */
    DEPTH_IN_A
}
