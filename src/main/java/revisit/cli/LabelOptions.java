package revisit.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import picocli.CommandLine.Option;
import revisit.evaluation.ExclusionWindow;
import revisit.evaluation.FrameTimeline;
import revisit.evaluation.IndexWindows;
import revisit.evaluation.PairsFile;
import revisit.evaluation.PoseAlignment;
import revisit.evaluation.PoseLabelConfig;
import revisit.evaluation.PoseLabels;
import revisit.evaluation.RevisitLabels;
import revisit.io.BadInputException;
import revisit.io.StampedPose;
import revisit.io.TrajectoryFile;
import revisit.pipeline.ScanConfig;

/** Where the labelled revisits come from: shared by {@code evaluate} and {@code tune}. */
final class LabelOptions {

    @Option(names = "--pairs", paramLabel = "FILE", description = "Revisit pairs file (docs/FORMAT-labels.md).")
    Path pairs;

    @Option(names = "--poses", paramLabel = "FILE", description = "Ground-truth trajectory, one per sequence in "
            + "scan order (repeat the option; docs/FORMAT-trajectory.md).")
    List<Path> poses = new ArrayList<>();

    @Option(names = "--max-distance", defaultValue = "1.0", paramLabel = "D",
            description = "With --poses: camera centres closer than this are a revisit (trajectory units).")
    double maxDistance;

    @Option(names = "--max-angle", defaultValue = "0", paramLabel = "DEG",
            description = "With --poses: also require viewing directions within this angle (0 = no limit).")
    double maxAngleDeg;

    @Option(names = "--frame-tolerance", defaultValue = "0", paramLabel = "N",
            description = "A detection within N frames of a labelled match counts as true.")
    int frameTolerance;

    /** Poses of every scanned frame in scan order (for the trajectory plot); filled by {@link #load}. */
    final List<StampedPose> allPoses = new ArrayList<>();

    /** Labels over the scanned frames, excluding what the scan's index excludes. */
    RevisitLabels load(FrameTimeline timeline, ScanConfig scanConfig) {
        ExclusionWindow window = IndexWindows.of(scanConfig.index());
        if ((pairs == null) == poses.isEmpty()) {
            throw new BadInputException("give the labels either as --pairs FILE or as --poses FILE (one per "
                    + "sequence), not both and not neither");
        }
        if (pairs != null) {
            return PairsFile.read(pairs, timeline, window);
        }
        if (poses.size() != timeline.sequences().size()) {
            throw new BadInputException("--poses: " + poses.size() + " trajectories given for "
                    + timeline.sequences().size() + " scanned sequences; give one per sequence in scan order");
        }
        Map<String, List<StampedPose>> bySeq = new LinkedHashMap<>();
        allPoses.clear();
        for (int s = 0; s < poses.size(); s++) {
            var frames = timeline.sequences().get(s);
            List<StampedPose> aligned = PoseAlignment.align(TrajectoryFile.read(poses.get(s)), frames, poses.get(s));
            bySeq.put(frames.sequenceId(), aligned);
            allPoses.addAll(aligned);
        }
        return PoseLabels.derive(bySeq, PoseLabelConfig.defaults().withMaxDistance(maxDistance)
                .withMaxViewAngleDegrees(maxAngleDeg > 0 ? maxAngleDeg : 180).withWindow(window));
    }
}
