package revisit.evaluation;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import revisit.io.FrameSources;
import revisit.pipeline.ScanOutputs;
import revisit.pipeline.SequenceInput;

/** Finds the image files of a scan's detections so the report can show them side by side. */
public final class ScanReportPairs {

    private ScanReportPairs() {
    }

    /**
     * Up to {@code max} detections (false ones first, then true ones) whose frames are image files that still
     * exist; detections in videos are left out.
     */
    public static List<ImagePair> pairs(Path scanDir, EvaluationResult result, int max) {
        List<SequenceInput> seqs = ScanOutputs.readSequences(scanDir);
        List<ImagePair> out = new ArrayList<>();
        List<JudgedDetection> ordered = new ArrayList<>(result.detections());
        ordered.sort((a, b) -> Boolean.compare(a.correct(), b.correct()));
        for (JudgedDetection d : ordered) {
            if (out.size() >= max) {
                break;
            }
            Path q = imageOf(seqs, d.query());
            Path m = imageOf(seqs, d.match());
            if (q != null && m != null) {
                out.add(new ImagePair(d.query(), d.match(), q, m));
            }
        }
        return out;
    }

    private static Path imageOf(List<SequenceInput> seqs, FrameKey key) {
        for (SequenceInput s : seqs) {
            if (s.name().equals(key.sequenceId()) && Files.isDirectory(s.path())) {
                List<Path> images = FrameSources.listImages(s.path());
                return key.frame() < images.size() ? images.get(key.frame()) : null;
            }
        }
        return null;
    }
}
