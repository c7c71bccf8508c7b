package revisit.verification;

/** Two-view model that explained the inliers best. */
public enum ModelKind {
    /** No model (rejected before or during fitting). */
    NONE,
    /** Calibrated epipolar geometry: rotation and translation direction observable. */
    ESSENTIAL,
    /** Uncalibrated epipolar geometry: no pose without a camera. */
    FUNDAMENTAL,
    /** Plane-induced homography: a planar scene (or, uncalibrated, possibly a pure rotation). */
    HOMOGRAPHY,
    /** Pure rotation about the camera centre (calibrated only): translation not observable. */
    ROTATION
}
