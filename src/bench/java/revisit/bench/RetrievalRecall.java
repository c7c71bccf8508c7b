package revisit.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalInt;
import revisit.evaluation.ExclusionWindow;
import revisit.evaluation.FrameKey;
import revisit.evaluation.PoseLabelConfig;
import revisit.evaluation.PoseLabels;
import revisit.evaluation.RevisitLabels;
import revisit.io.StampedPose;

/**
 * Top-k recall of one retrieval system on a described scenario: frames are queried in scan order, each against
 * all earlier frames (then added), as a scan would. A labelled query is one with at least one true revisit among
 * the frames it may match (ground truth from the poses, same exclusion window as the systems); it counts for
 * top-k when one of its first k hits is a true revisit ({@link RevisitLabels#isTrueMatch}, exact frame).
 */
final class RetrievalRecall {

    /** The hits of every query, in scan order, and the thread CPU time of each query, nanoseconds. */
    record Run(String system, List<List<RetrievalSystem.Hit>> hits, long[] queryCpuNanos) {
    }

    /** Recall under one label rule. */
    record Recall(String system, double maxDistance, double maxAngleDegrees, int labelled, int top1, int top5) {
    }

    private static final ThreadMXBean CPU = ManagementFactory.getThreadMXBean();

    private RetrievalRecall() {
    }

    static Run scan(RetrievalSystem system, List<ScenarioDescriptors.SceneFrame> frames, int limit) {
        List<List<RetrievalSystem.Hit>> hits = new ArrayList<>(frames.size());
        long[] cpu = new long[frames.size()];
        for (int i = 0; i < frames.size(); i++) {
            DescriptorFrame f = frames.get(i).frame();
            long c0 = CPU.getCurrentThreadCpuTime();
            hits.add(system.query(f, limit));
            cpu[i] = CPU.getCurrentThreadCpuTime() - c0;
            system.add(f);
        }
        return new Run(system.name(), hits, cpu);
    }

    /** Labels from the scenario's poses: camera centres within {@code maxDistance} m, views within the angle. */
    static RevisitLabels labels(List<ScenarioDescriptors.SceneFrame> frames, double maxDistance,
                                double maxAngleDegrees, ExclusionWindow window) {
        Map<String, List<StampedPose>> poses = new LinkedHashMap<>();
        for (ScenarioDescriptors.SceneFrame f : frames) {
            poses.computeIfAbsent(f.sessionName(), k -> new ArrayList<>()).add(f.pose());
        }
        return PoseLabels.derive(poses, PoseLabelConfig.defaults().withMaxDistance(maxDistance)
                .withMaxViewAngleDegrees(maxAngleDegrees).withWindow(window));
    }

    static Recall recall(Run run, List<ScenarioDescriptors.SceneFrame> frames, RevisitLabels labels,
                         double maxDistance, double maxAngleDegrees) {
        List<String> names = frames.stream().map(ScenarioDescriptors.SceneFrame::sessionName).distinct().toList();
        int labelled = 0;
        int top1 = 0;
        int top5 = 0;
        for (int i = 0; i < frames.size(); i++) {
            FrameKey query = new FrameKey(frames.get(i).sessionName(), frames.get(i).frame().frame());
            if (!labels.isPositive(query)) {
                continue;
            }
            labelled++;
            OptionalInt firstTrue = firstTrueRank(run.hits().get(i), query, labels, names);
            top1 += firstTrue.isPresent() && firstTrue.getAsInt() == 0 ? 1 : 0;
            top5 += firstTrue.isPresent() && firstTrue.getAsInt() < 5 ? 1 : 0;
        }
        return new Recall(run.system(), maxDistance, maxAngleDegrees, labelled, top1, top5);
    }

    /** Rank (0 = best) of the first true revisit among the hits; empty when none is. */
    private static OptionalInt firstTrueRank(List<RetrievalSystem.Hit> hits, FrameKey query, RevisitLabels labels,
                                     List<String> names) {
        for (int r = 0; r < hits.size(); r++) {
            FrameKey match = new FrameKey(names.get(hits.get(r).sequence()), hits.get(r).frame());
            if (labels.isTrueMatch(query, match, 0)) {
                return OptionalInt.of(r);
            }
        }
        return OptionalInt.empty();
    }
}
