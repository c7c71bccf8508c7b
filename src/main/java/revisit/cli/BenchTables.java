package revisit.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import revisit.evaluation.MatcherComparison;
import revisit.evaluation.RevisitLabels;
import revisit.evaluation.TrustedRecall;
import revisit.evaluation.VerificationCeiling;
import revisit.pipeline.ScanResult;
import revisit.pipeline.SequenceInput;
import revisit.pipeline.StageTimes;

/** The tables {@code bench} prints (Markdown, so they paste into docs/BENCHMARKS.md). */
final class BenchTables {

    private BenchTables() {
    }

    static void header(PrintWriter o, Path scenario, Path vocabulary, List<SequenceInput> sessions) {
        o.println("bench: scenario " + scenario + ", vocabulary " + vocabulary + ", sessions "
                + sessions.stream().map(SequenceInput::name).toList());
        o.println("(timed after a warm-up scan of the first " + BenchCommand.WARM_UP_FRAMES + " frames of "
                + sessions.get(0).name() + "; CPU is thread CPU time, per frame except verify, which is per "
                + "verified query)");
        o.println();
        o.println("| threads | stage | count | mean ms | p99 ms | mean CPU ms |");
        o.println("|---|---|---|---|---|---|");
        o.flush();
    }

    static void stages(PrintWriter o, int threads, ScanResult r, long wallNanos) {
        int frames = r.times().summary(StageTimes.Stage.READ).count();
        double cpuMs = 0;
        for (StageTimes.Stage s : StageTimes.Stage.values()) {
            StageTimes.Summary m = r.times().summary(s);
            o.println(f("| %d | %s | %d | %.2f | %.2f | %.2f |", threads, s, m.count(), m.meanMs(), m.p99Ms(),
                    m.meanCpuMs()));
            if (s != StageTimes.Stage.QUERY && s != StageTimes.Stage.VERIFY) {
                cpuMs += m.meanCpuMs() * m.count();
            }
        }
        o.println(f("| %d | CPU per frame (read + features + words + in-order total) | %d | | | %.2f |", threads,
                frames, cpuMs / Math.max(1, frames)));
        o.println(f("| %d | wall per frame | %d | %.2f | | |", threads, frames, wallNanos / 1e6 / Math.max(1, frames)));
        o.flush();
    }

    static void cost(PrintWriter o, int frames, int stride, ScanResult ours, MatcherComparison.Result matching,
                     VerificationCeiling.Result ceiling) {
        StageTimes.Summary verify = ours.times().summary(StageTimes.Stage.VERIFY);
        long ourVerifications = ours.closures().size();
        double ourCpuMs = matching.nodes().cpuNanos() / 1e6;
        double ceilingCpuMs = ceiling.cpuNanos() / 1e6;
        o.println();
        o.println(f("Exhaustive verification against the scan, every %d-th frame of each session (%d frames):",
                stride, frames));
        o.println();
        o.println("| cost | exhaustive (brute force, all allowed pairs) | our scan | ours / exhaustive |");
        o.println("|---|---|---|---|");
        o.println(f("| verifications | %d | %d | %s |", ceiling.pairs(), ourVerifications,
                pct(ourVerifications, ceiling.pairs())));
        o.println(f("| verification CPU ms | %.0f | %.0f (same pairs re-verified) | %s |", ceilingCpuMs, ourCpuMs,
                pct(ourCpuMs, ceilingCpuMs)));
        o.println(f("| verification wall ms | %.0f (2 threads) | %.0f (scan VERIFY stage, %d queries) | |",
                ceiling.nanos() / 1e6, verify.meanMs() * verify.count(), verify.count()));
        o.flush();
    }

    static void recallHeader(PrintWriter o) {
        o.println();
        o.println("| labels | exhaustive accepted | exhaustive accepted & true | exhaustive query frames found "
                + "| our trusted | our trusted & true | our frames found at 100% precision | ours / exhaustive |");
        o.println("|---|---|---|---|---|---|---|---|");
    }

    static void recall(PrintWriter o, double maxDistance, double maxAngle, VerificationCeiling.Result ceiling,
                       RevisitLabels labels, TrustedRecall.Result ours) {
        int ceilingFound = ceiling.queriesFound(labels).size();
        int ourFound = ours.foundAtFullPrecision().size();
        o.println(f("| <= %.1f m, <= %.0f deg | %d | %d | %d | %d | %d | %d | %s |", maxDistance, maxAngle,
                ceiling.accepted().size(), ceiling.acceptedTrue(labels), ceilingFound, ours.trusted(),
                ours.trustedTrue(), ourFound, pct(ourFound, ceilingFound)));
        o.flush();
    }

    static void matchers(PrintWriter o, MatcherComparison.Result r) {
        o.println();
        o.println("Matching on the pairs our scan verified:");
        o.println();
        o.println("| matcher | pairs | accepted | mean putative matches | mean inliers | ms per pair |");
        o.println("|---|---|---|---|---|---|");
        row(o, "vocabulary node", r.nodes());
        row(o, "brute force", r.bruteForce());
        o.flush();
    }

    private static void row(PrintWriter o, String name, MatcherComparison.Totals t) {
        double n = Math.max(1, t.pairs());
        o.println(f("| %s | %d | %d | %.1f | %.1f | %.2f |", name, t.pairs(), t.accepted(), t.matches() / n,
                t.inliers() / n, t.msPerPair()));
    }

    private static String pct(double part, double whole) {
        return whole == 0 ? "n/a" : f("%.1f%%", 100 * part / whole);
    }

    private static String f(String format, Object... args) {
        return String.format(Locale.ROOT, format, args);
    }
}
