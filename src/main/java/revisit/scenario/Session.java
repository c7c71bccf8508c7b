package revisit.scenario;

/**
 * One recording over the yard.
 *
 * @param name         folder name, "session1" or "session2"
 * @param route        camera motion
 * @param frameCount   frames recorded
 * @param rateHz       frames per second
 * @param lighting     sun and exposure of this session
 * @param clockOffset  seconds added to the session's own time stamps to get the world clock that moves walkers
 */
public record Session(String name, Route route, int frameCount, double rateHz, Lighting lighting,
                      double clockOffset) {

    /** Time stamp of frame i, seconds since the session's first frame. */
    public double time(int frame) {
        return frame / rateHz;
    }
}
