package revisit.pipeline;

import java.util.List;

/**
 * Everything a scan produced.
 *
 * @param closures   verified closures (and rejected candidates when asked for), in scan order
 * @param traces     one trace per query frame, in scan order
 * @param sequences  the sequences scanned, in order (their index is the sequence id)
 * @param skipped    one line per frame that could not be read
 * @param times      per-stage timing
 * @param resumed    frames recovered from a checkpoint instead of being read again
 * @param stoppedEarly a one-line reason when the scan stopped before the end (bad-frame policy STOP), else empty
 */
public record ScanResult(List<Closure> closures, List<QueryTrace> traces, List<SequenceInput> sequences,
                         List<String> skipped, StageTimes times, int resumed, String stoppedEarly) {
}
