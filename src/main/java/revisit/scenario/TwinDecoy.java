package revisit.scenario;

/**
 * Two visits of different places that carry identical textures: the views look alike but the camera is far
 * from where it was, so a closure between them is false (bait for consistency checks).
 *
 * @param group      twin group name
 * @param first      visit of one twin
 * @param second     visit of the other twin
 * @param distanceM  distance between the two places' anchors, metres
 */
public record TwinDecoy(String group, Visit first, Visit second, double distanceM) {
}
