package revisit.evaluation;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import revisit.io.BadInputException;
import revisit.io.StampedPose;

/** Gives each scanned frame the ground-truth pose nearest to it in time. */
public final class PoseAlignment {

    private PoseAlignment() {
    }

    /**
     * One pose per frame of {@code frames}, stamped with the frame's time.
     *
     * @param poses  trajectory, times increasing
     * @param frames the frames of one sequence as scanned
     * @param source file the poses came from, for messages
     * @throws BadInputException when a frame has no pose within half a frame interval
     */
    public static List<StampedPose> align(List<StampedPose> poses, SequenceFrames frames, Path source) {
        double tolerance = Math.max(1e-6, 0.5 * frames.medianIntervalSeconds());
        List<StampedPose> out = new ArrayList<>(frames.size());
        int j = 0;
        for (int i = 0; i < frames.size(); i++) {
            double t = frames.timeOf(i);
            while (j + 1 < poses.size() && Math.abs(poses.get(j + 1).timeSeconds() - t)
                    <= Math.abs(poses.get(j).timeSeconds() - t)) {
                j++;
            }
            StampedPose p = poses.get(j);
            if (Math.abs(p.timeSeconds() - t) > tolerance) {
                throw new BadInputException(source + ": no pose within " + tolerance + " s of frame " + i + " of "
                        + frames.sequenceId() + " (time " + t + " s, nearest pose at " + p.timeSeconds()
                        + " s); give poses stamped with the frames' times");
            }
            out.add(new StampedPose(t, p.x(), p.y(), p.z(), p.qx(), p.qy(), p.qz(), p.qw()));
        }
        return out;
    }
}
