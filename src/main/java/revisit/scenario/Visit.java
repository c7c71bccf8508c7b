package revisit.scenario;

/**
 * A planned pass of the route over a place's anchor.
 *
 * @param place      place name
 * @param session    session index (0 = first)
 * @param frame      frame index within the session nearest to the pass
 * @param headingDeg planned heading of the optical axis at the pass (travel direction plus glance, without the
 *                   small random sway), degrees from east towards north in [0, 360)
 */
public record Visit(String place, int session, int frame, double headingDeg) {
}
