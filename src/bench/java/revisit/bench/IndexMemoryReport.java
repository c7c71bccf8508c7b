package revisit.bench;

import java.util.Locale;
import org.openjdk.jol.info.GraphLayout;
import revisit.index.IndexConfig;
import revisit.index.RevisitDatabase;
import revisit.index.WordWeights;

/**
 * Memory of the revisit database at 1k, 10k and 100k frames of 500 Zipf-distributed features over 10^6 words: the
 * database's own count of its index structures, and the retained size JOL measures by walking the object graph
 * (vocabulary weight table excluded, it belongs to the vocabulary). Prints a Markdown table.
 *
 * <p>Run: {@code mvn -B -Pbench -DskipTests package && java -Xmx3g -Djol.magicFieldOffset=true
 * -cp target/benchmarks.jar revisit.bench.IndexMemoryReport}
 */
public final class IndexMemoryReport {

    private IndexMemoryReport() {
    }

    public static void main(String[] args) {
        int[] sizes = {1000, 10_000, 100_000};
        SyntheticScan scan = new SyntheticScan(1_000_000, 1.0, 500, 1000, 42L);
        WordWeights weights = scan.weights();
        RevisitDatabase database = new RevisitDatabase(weights, IndexConfig.defaults());
        long weightTable = GraphLayout.parseInstance(weights).totalSize();
        System.out.println("| frames | postings | postings/frame | counted MB | counted B/frame | JOL MB | JOL B/frame"
                + " | B/frame above 1k |");
        System.out.println("|---|---|---|---|---|---|---|---|");
        long baseBytes = 0;
        int added = 0;
        for (int size : sizes) {
            while (added < size) {
                database.add(scan.frame(0, added, added * 0.1, scan.words()));
                added++;
            }
            long counted = database.memoryBytes();
            long jol = GraphLayout.parseInstance(database).totalSize() - weightTable;
            baseBytes = size == sizes[0] ? jol : baseBytes;
            String slope = size == sizes[0] ? "-" : String.valueOf((jol - baseBytes) / (size - sizes[0]));
            System.out.printf(Locale.ROOT, "| %d | %d | %.1f | %.1f | %d | %.1f | %d | %s |%n", size,
                    database.postingCount(), database.postingCount() / (double) size, counted / 1e6,
                    counted / size, jol / 1e6, jol / size, slope);
        }
    }
}
