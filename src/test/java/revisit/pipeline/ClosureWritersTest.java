package revisit.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ClosureWritersTest {

    @TempDir
    Path dir;

    static Closure sample(ClosureStatus status) {
        double[] info = new double[36];
        for (int r = 0; r < 6; r++) {
            for (int c = 0; c < 6; c++) {
                info[r * 6 + c] = r == c ? 100 + r : 0.5;
            }
        }
        return new Closure(1, 250, 25.0, "frame,250.png", 0, 12, 1.2, "frame12.png", 0.31, 1.7, 87, 0.62,
                "essential", new double[]{0, 0, 0.0871557, 0.9961947}, new double[]{0.6, 0, 0.8}, false, info,
                status, "", 0.9);
    }

    @Test
    void edgeLineHasPoseThenTwentyOneInformationEntries() {
        String line = ClosureWriters.edgeLine(sample(ClosureStatus.TRUSTED));
        String[] f = line.split(" ");
        // EDGE_SE3:QUAT from to x y z qx qy qz qw + 21 upper-triangular entries (common practice of text pose graphs)
        assertEquals(1 + 2 + 7 + 21, f.length);
        assertEquals("EDGE_SE3:QUAT", f[0]);
        assertEquals("12", f[1]);
        assertEquals(String.valueOf(ClosureWriters.VERTEX_STRIDE + 250), f[2]);
        assertEquals(0.6, Double.parseDouble(f[3]));
        assertEquals(0.9961947, Double.parseDouble(f[9]));
        assertEquals(100.0, Double.parseDouble(f[10]));
        assertEquals(0.5, Double.parseDouble(f[11]));
        assertEquals(105.0, Double.parseDouble(f[30]));
    }

    @Test
    void rejectedCandidatesNeverBecomeEdges() throws Exception {
        Path f = dir.resolve("edges.txt");
        ClosureWriters.writeEdges(f, List.of(sample(ClosureStatus.TRUSTED), sample(ClosureStatus.REJECTED)));
        List<String> lines = Files.readAllLines(f);
        assertEquals(2, lines.size());
        assertTrue(lines.get(0).startsWith("# revisit-edges 1"));
    }

    @Test
    void jsonLinesStartWithHeaderAndRoundTripValues() throws Exception {
        Path f = dir.resolve("c.jsonl");
        ClosureWriters.writeJsonLines(f, List.of(sample(ClosureStatus.UNCHECKED)));
        List<String> lines = Files.readAllLines(f);
        ObjectMapper m = new ObjectMapper();
        assertEquals("revisit-closures", m.readTree(lines.get(0)).get("format").asText());
        JsonNode c = m.readTree(lines.get(1));
        assertEquals(250, c.get("query_frame").asInt());
        assertEquals("unchecked", c.get("status").asText());
        assertEquals(36, c.get("information").size());
    }

    @Test
    void csvQuotesNamesWithCommas() throws Exception {
        Path f = dir.resolve("c.csv");
        ClosureWriters.writeCsv(f, List.of(sample(ClosureStatus.TRUSTED)));
        List<String> lines = Files.readAllLines(f);
        assertEquals(lines.get(0).split(",").length, 24 + 21);
        assertTrue(lines.get(1).contains("\"frame,250.png\""), lines.get(1));
    }
}
