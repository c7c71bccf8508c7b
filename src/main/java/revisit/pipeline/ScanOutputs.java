package revisit.pipeline;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import revisit.io.AtomicFiles;

/**
 * Writes everything a scan leaves in its output folder, each file atomically: the closures in three formats, the
 * per-query traces (read back by {@code evaluate} and {@code tune}), the effective configuration, and a summary.
 */
public final class ScanOutputs {

    /** File names inside the output folder. */
    public static final String JSONL = "closures.jsonl";
    public static final String CSV = "closures.csv";
    public static final String EDGES = "closures.edges.txt";
    public static final String TRACES = "queries.csv";
    public static final String CONFIG = "config.used.json";
    public static final String SUMMARY = "summary.txt";
    public static final String CHECKPOINT = "scan.ckpt";
    public static final String SEQUENCES = "sequences.txt";

    private ScanOutputs() {
    }

    /**
     * Writes all outputs.
     *
     * @param dir         output folder
     * @param result      the scan's result
     * @param config      the effective configuration
     * @param includeUnchecked also write closures the consistency check could not corroborate to the edge file
     */
    public static void write(Path dir, ScanResult result, ScanConfig config, boolean includeUnchecked) {
        List<Closure> all = result.closures();
        ClosureWriters.writeJsonLines(dir.resolve(JSONL), all);
        ClosureWriters.writeCsv(dir.resolve(CSV), all);
        List<Closure> edges = all.stream().filter(c -> c.status() == ClosureStatus.TRUSTED
                || (includeUnchecked && c.status() == ClosureStatus.UNCHECKED)).toList();
        ClosureWriters.writeEdges(dir.resolve(EDGES), edges);
        writeTraces(dir.resolve(TRACES), result);
        ConfigFile.write(dir.resolve(CONFIG), config, "effective configuration of the scan that wrote this folder");
        AtomicFiles.writeString(dir.resolve(SUMMARY), summary(result));
        StringBuilder seq = new StringBuilder("# revisit-sequences 1: id, name, absolute path\n");
        for (int i = 0; i < result.sequences().size(); i++) {
            SequenceInput in = result.sequences().get(i);
            seq.append(i).append('\t').append(in.name()).append('\t')
                    .append(in.path().toAbsolutePath().normalize()).append('\n');
        }
        AtomicFiles.writeString(dir.resolve(SEQUENCES), seq.toString());
    }

    /** Reads the sequences a scan wrote (id order). */
    public static List<SequenceInput> readSequences(Path dir) {
        Path file = dir.resolve(SEQUENCES);
        try {
            List<SequenceInput> out = new java.util.ArrayList<>();
            for (String line : java.nio.file.Files.readAllLines(file, StandardCharsets.UTF_8)) {
                if (line.startsWith("#") || line.isBlank()) {
                    continue;
                }
                String[] f = line.split("\t");
                if (f.length != 3) {
                    throw new revisit.io.BadInputException(file + ": malformed line '" + line + "'");
                }
                out.add(new SequenceInput(Path.of(f[2]), f[1]));
            }
            return out;
        } catch (java.io.IOException e) {
            throw new revisit.io.BadInputException(file + ": cannot read (" + e.getMessage()
                    + "); point at the output folder of a scan", e);
        }
    }

    /** Per-query traces as CSV (docs/FORMAT-closures.md). */
    static void writeTraces(Path file, ScanResult result) {
        AtomicFiles.write(file, out -> {
            StringBuilder sb = new StringBuilder("# revisit-queries 1\n");
            sb.append("sequence,sequence_name,frame,time,stage,match_sequence,match_frame,score,inliers,reason\n");
            for (QueryTrace t : result.traces()) {
                sb.append(t.sequence()).append(',').append(csv(result.sequences().get(t.sequence()).name()))
                        .append(',').append(t.frame()).append(',').append(t.time()).append(',')
                        .append(t.stage().name().toLowerCase(Locale.ROOT)).append(',').append(t.matchSequence())
                        .append(',').append(t.matchFrame()).append(',').append(t.score()).append(',')
                        .append(t.inliers().isPresent() ? String.valueOf(t.inliers().getAsInt()) : "")
                        .append(',').append(csv(t.reason())).append('\n');
                if (sb.length() > 1 << 16) {
                    out.write(sb.toString().getBytes(StandardCharsets.UTF_8));
                    sb.setLength(0);
                }
            }
            out.write(sb.toString().getBytes(StandardCharsets.UTF_8));
        });
    }

    /** A human-readable summary: counts per status and stage, and per-stage timing. */
    public static String summary(ScanResult r) {
        StringBuilder sb = new StringBuilder();
        long frames = r.traces().size();
        sb.append(String.format(Locale.ROOT, "frames: %d in %d sequence(s), %d skipped, %d recovered from checkpoint%n",
                frames, r.sequences().size(), r.skipped().size(), r.resumed()));
        for (ClosureStatus s : ClosureStatus.values()) {
            long n = r.closures().stream().filter(c -> c.status() == s).count();
            if (n > 0 || s != ClosureStatus.REJECTED) {
                sb.append(String.format(Locale.ROOT, "closures %-11s %d%n", s.name().toLowerCase(Locale.ROOT), n));
            }
        }
        for (QueryStage s : QueryStage.values()) {
            long n = r.traces().stream().filter(t -> t.stage() == s).count();
            sb.append(String.format(Locale.ROOT, "queries %-12s %d%n", s.name().toLowerCase(Locale.ROOT), n));
        }
        sb.append(String.format(Locale.ROOT, "%-9s %7s %9s %9s %9s%n", "stage", "count", "mean ms", "p99 ms",
                "cpu ms"));
        for (StageTimes.Stage st : StageTimes.Stage.values()) {
            StageTimes.Summary s = r.times().summary(st);
            sb.append(String.format(Locale.ROOT, "%-9s %7d %9.2f %9.2f %9.2f%n", st.name().toLowerCase(Locale.ROOT),
                    s.count(), s.meanMs(), s.p99Ms(), s.meanCpuMs()));
        }
        if (!r.stoppedEarly().isEmpty()) {
            sb.append("stopped early: ").append(r.stoppedEarly()).append('\n');
        }
        return sb.toString();
    }

    private static String csv(String s) {
        if (s.indexOf(',') < 0 && s.indexOf('"') < 0 && s.indexOf('\n') < 0) {
            return s;
        }
        return '"' + s.replace("\"", "\"\"") + '"';
    }
}
