package revisit.scenario;

/**
 * A named place of the invented yard. Its anchor lies on a walking lane; the route's passes over the anchor are
 * the planted visits, and two visits of one place are a planted revisit.
 *
 * @param name        unique display name
 * @param x           anchor east, metres
 * @param y           anchor north, metres
 * @param description what a person sees there
 * @param glanceDeg   head turn towards the yard's outer wall while passing, degrees (0 = look ahead); the sign is
 *                    chosen per pass so the camera always turns towards the wall
 * @param twinGroup   places sharing a non-empty group carry identical textures (perceptual aliasing), else ""
 */
public record Place(String name, double x, double y, String description, double glanceDeg, String twinGroup) {
}
