package revisit.bench;

import java.util.Locale;
import java.util.SplittableRandom;
import revisit.index.Candidate;
import revisit.index.FrameWords;
import revisit.index.IndexConfig;
import revisit.index.QueryResult;
import revisit.index.RevisitDatabase;
import revisit.index.RevisitSearch;
import revisit.index.WordVector;

/**
 * Effect of the stop list on ranking: a database of N synthetic frames (500 Zipf features over 10^6 words), queried
 * with revisits of stored frames in which each feature keeps its word with probability {@code keep}. For each stop
 * list setting it prints how often the revisited frame ranks first, its mean rank when found among the 50
 * candidates, and the mean query weight left out. A fraction of 1e-6 leaves only the floor of 2000 frames
 * ({@link IndexConfig#stopListMinFrames()}): a fixed cap on the lists walked. Prints a Markdown table.
 *
 * <p>Run: {@code mvn -B -Pbench -DskipTests package && java -Xmx3g -cp target/benchmarks.jar
 * revisit.bench.StopListReport 100000}
 */
public final class StopListReport {

    private static final int QUERIES = 400;

    private StopListReport() {
    }

    public static void main(String[] args) {
        int frames = args.length > 0 ? Integer.parseInt(args[0]) : 100_000;
        SyntheticScan scan = new SyntheticScan(1_000_000, 1.0, 500, 1000, 42L);
        IndexConfig exact = IndexConfig.defaults().withMaxWordFrameFraction(1.0);
        RevisitDatabase database = new RevisitDatabase(scan.weights(), exact);
        SplittableRandom pick = new SplittableRandom(7L);
        int[] targets = new int[QUERIES];
        for (int q = 0; q < QUERIES; q++) {
            targets[q] = pick.nextInt(frames);
        }
        int[][] kept = new int[QUERIES][];
        for (int i = 0; i < frames; i++) {
            int[] words = scan.words();
            for (int q = 0; q < QUERIES; q++) {
                kept[q] = targets[q] == i ? words : kept[q];
            }
            database.add(scan.frame(0, i, i * 0.1, words));
        }
        System.out.println("| frames | keep | maxWordFrameFraction | revisited frame first | mean rank when listed"
                + " | mean stop-word weight |");
        System.out.println("|---|---|---|---|---|---|");
        for (double keep : new double[]{0.2, 0.1, 0.05}) {
            FrameWords[] queries = new FrameWords[QUERIES];
            for (int q = 0; q < QUERIES; q++) {
                queries[q] = scan.frame(1, q, q, scan.revisit(kept[q], keep));
            }
            for (double fraction : new double[]{1.0, 0.1, 0.05, 1e-6}) {
                report(database, exact.withMaxWordFrameFraction(fraction), queries, targets, frames, keep);
            }
        }
    }

    private static void report(RevisitDatabase database, IndexConfig config, FrameWords[] queries, int[] targets,
                               int frames, double keep) {
        int first = 0;
        int listed = 0;
        double rankSum = 0;
        double stopWeight = 0;
        for (int q = 0; q < queries.length; q++) {
            WordVector vector = database.vectorOf(queries[q].words());
            QueryResult result = new RevisitSearch(database, config).query(queries[q], vector);
            stopWeight += result.stopWordWeight();
            for (int r = 0; r < result.candidates().size(); r++) {
                Candidate c = result.candidates().get(r);
                if (c.frameId() == targets[q]) {
                    first += r == 0 ? 1 : 0;
                    listed++;
                    rankSum += r + 1;
                }
            }
        }
        System.out.printf(Locale.ROOT, "| %d | %.2f | %s | %d / %d | %.2f | %.3f |%n", frames, keep,
                config.maxWordFrameFraction(), first, queries.length, listed == 0 ? 0 : rankSum / listed,
                stopWeight / queries.length);
    }
}
