package revisit.bench;

import java.io.PrintStream;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/** The comparison's one Markdown table: a metric per row, ours, BoofCV and BoofCV / ours. */
final class RetrievalTable {

    private final PrintStream out;

    RetrievalTable(PrintStream out) {
        this.out = out;
        out.println("| metric | ours | BoofCV | BoofCV / ours |");
        out.println("|---|---|---|---|");
    }

    void row(String metric, double ours, double boof, String format) {
        String ratio = ours == 0 ? "-" : String.format(Locale.ROOT, "%.2f", boof / ours);
        out.printf(Locale.ROOT, "| %s | " + format + " | " + format + " | %s |%n", metric, ours, boof, ratio);
    }

    void rowOursOnly(String metric, double ours, String format, String why) {
        out.printf(Locale.ROOT, "| %s | " + format + " | %s | - |%n", metric, ours, why);
    }

    void recall(RetrievalRecall.Recall ours, RetrievalRecall.Recall boof) {
        String rule = String.format(Locale.ROOT, "%.0f m / %.0f deg, %d labelled queries", ours.maxDistance(),
                ours.maxAngleDegrees(), ours.labelled());
        row("scenario top-1 recall (" + rule + ")", share(ours.top1(), ours.labelled()),
                share(boof.top1(), boof.labelled()), "%.3f");
        row("scenario top-5 recall (" + rule + ")", share(ours.top5(), ours.labelled()),
                share(boof.top5(), boof.labelled()), "%.3f");
    }

    void scale(List<RetrievalScale.Point> ours, List<RetrievalScale.Point> boof) {
        for (RetrievalScale.Point o : ours) {
            String n = String.format(Locale.ROOT, "%,d frames", o.frames());
            Optional<RetrievalScale.Point> match = boof.stream().filter(p -> p.frames() == o.frames()).findFirst();
            if (match.isEmpty()) {
                rowOursOnly("query CPU p50 us, " + n, o.queryCpuP50Us(), "%.0f", "not run (size cap)");
                continue;
            }
            RetrievalScale.Point b = match.get();
            row("add CPU mean us (growing to " + n + ")", o.addCpuMeanUs(), b.addCpuMeanUs(), "%.0f");
            row("add wall mean us (growing to " + n + ")", o.addWallMeanUs(), b.addWallMeanUs(), "%.0f");
            row("query CPU p50 us, " + n, o.queryCpuP50Us(), b.queryCpuP50Us(), "%.0f");
            row("query CPU p99 us, " + n, o.queryCpuP99Us(), b.queryCpuP99Us(), "%.0f");
            row("query wall p50 us, " + n, o.queryWallP50Us(), b.queryWallP50Us(), "%.0f");
            row("query wall p99 us, " + n, o.queryWallP99Us(), b.queryWallP99Us(), "%.0f");
            row("retained bytes per frame, " + n, o.retainedBytes() / (double) o.frames(),
                    b.retainedBytes() / (double) b.frames(), "%.0f");
            row("synthetic revisit top-1, " + n, o.revisitTop1(), b.revisitTop1(), "%.3f");
        }
        if (ours.size() >= 2 && boof.size() >= 2) {
            RetrievalScale.Point o0 = ours.get(boof.size() - 2);
            RetrievalScale.Point o1 = ours.get(boof.size() - 1);
            RetrievalScale.Point b0 = boof.get(boof.size() - 2);
            RetrievalScale.Point b1 = boof.get(boof.size() - 1);
            row(String.format(Locale.ROOT, "marginal bytes per frame, %,d to %,d frames", b0.frames(), b1.frames()),
                    (o1.retainedBytes() - o0.retainedBytes()) / (double) (o1.frames() - o0.frames()),
                    (b1.retainedBytes() - b0.retainedBytes()) / (double) (b1.frames() - b0.frames()), "%.0f");
        }
    }

    private static double share(int n, int of) {
        return of == 0 ? 0 : n / (double) of;
    }
}
