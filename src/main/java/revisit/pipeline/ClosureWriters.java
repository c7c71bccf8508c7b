package revisit.pipeline;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import revisit.io.AtomicFiles;

/**
 * Writes closures in the three export formats documented in docs/FORMAT-closures.md: JSON Lines (one closure
 * per line, first line a header object), CSV, and plain pose-graph edges ({@code EDGE_SE3:QUAT}, the text edge
 * that common graph optimizers read: relative pose then the 21 upper-triangular entries of the 6x6 information
 * matrix in the order x, y, z, rotation x, y, z). Every file is written atomically.
 */
public final class ClosureWriters {

    /** Schema version of all three outputs. */
    public static final int SCHEMA_VERSION = 1;
    /** Vertex id of frame f of sequence s in the edge file: {@code s * VERTEX_STRIDE + f}. */
    public static final long VERTEX_STRIDE = 10_000_000L;

    private static final ObjectMapper JSON = new ObjectMapper();

    private ClosureWriters() {
    }

    /** Vertex id used in the edge file. */
    public static long vertexId(int sequence, int frame) {
        return sequence * VERTEX_STRIDE + frame;
    }

    /** Writes JSON Lines: a header line {"format":"revisit-closures","version":1,...} then one closure a line. */
    public static void writeJsonLines(Path file, List<Closure> closures) {
        AtomicFiles.write(file, out -> {
            ObjectNode head = JSON.createObjectNode();
            head.put("format", "revisit-closures").put("version", SCHEMA_VERSION).put("count", closures.size());
            line(out, JSON.writeValueAsString(head));
            for (Closure c : closures) {
                line(out, JSON.writeValueAsString(toJson(c)));
            }
        });
    }

    /** One closure as a JSON object (also used by the HTML report). */
    public static ObjectNode toJson(Closure c) {
        ObjectNode o = JSON.createObjectNode();
        o.put("query_sequence", c.querySequence()).put("query_frame", c.queryFrame())
                .put("query_time", c.queryTime()).put("query_name", c.queryName())
                .put("match_sequence", c.matchSequence()).put("match_frame", c.matchFrame())
                .put("match_time", c.matchTime()).put("match_name", c.matchName())
                .put("score", c.score()).put("normalised_score", c.normalisedScore())
                .put("inliers", c.inliers()).put("inlier_ratio", c.inlierRatio()).put("model", c.model())
                .put("status", c.status().name().toLowerCase(Locale.ROOT)).put("reason", c.reason())
                .put("confidence", c.confidence()).put("metric", c.metric());
        array(o.putArray("rotation_xyzw"), c.quaternion());
        array(o.putArray("translation"), c.translation());
        array(o.putArray("information"), c.information());
        return o;
    }

    /** Writes CSV with a header row; the information matrix is given as its 21 upper-triangular entries. */
    public static void writeCsv(Path file, List<Closure> closures) {
        AtomicFiles.write(file, out -> {
            StringBuilder head = new StringBuilder("query_sequence,query_frame,query_time,query_name,match_sequence,"
                    + "match_frame,match_time,match_name,score,normalised_score,inliers,inlier_ratio,model,status,"
                    + "reason,confidence,metric,qx,qy,qz,qw,tx,ty,tz");
            for (int r = 0; r < 6; r++) {
                for (int k = r; k < 6; k++) {
                    head.append(",i").append(r).append(k);
                }
            }
            line(out, head.toString());
            for (Closure c : closures) {
                line(out, csvRow(c));
            }
        });
    }

    private static String csvRow(Closure c) {
        StringBuilder sb = new StringBuilder();
        sb.append(c.querySequence()).append(',').append(c.queryFrame()).append(',').append(num(c.queryTime()))
                .append(',').append(csvText(c.queryName())).append(',').append(c.matchSequence()).append(',')
                .append(c.matchFrame()).append(',').append(num(c.matchTime())).append(',')
                .append(csvText(c.matchName())).append(',').append(num(c.score())).append(',')
                .append(num(c.normalisedScore())).append(',').append(c.inliers()).append(',')
                .append(num(c.inlierRatio())).append(',').append(c.model()).append(',')
                .append(c.status().name().toLowerCase(Locale.ROOT)).append(',').append(csvText(c.reason()))
                .append(',').append(num(c.confidence())).append(',').append(c.metric());
        for (double v : c.quaternion()) {
            sb.append(',').append(num(v));
        }
        for (double v : c.translation()) {
            sb.append(',').append(num(v));
        }
        for (int r = 0; r < 6; r++) {
            for (int k = r; k < 6; k++) {
                sb.append(',').append(num(c.information()[r * 6 + k]));
            }
        }
        return sb.toString();
    }

    /**
     * Writes pose-graph edges: {@code EDGE_SE3:QUAT from to x y z qx qy qz qw} followed by the upper triangle of
     * the information matrix, from = matched frame's vertex, to = query frame's vertex. Rejected candidates are
     * never written here.
     */
    public static void writeEdges(Path file, List<Closure> closures) {
        AtomicFiles.write(file, out -> {
            line(out, "# revisit-edges " + SCHEMA_VERSION + ": vertex id = sequence * " + VERTEX_STRIDE
                    + " + frame; pose of the query camera in the matched camera's frame");
            for (Closure c : closures) {
                if (c.status() == ClosureStatus.REJECTED) {
                    continue;
                }
                line(out, edgeLine(c));
            }
        });
    }

    static String edgeLine(Closure c) {
        StringBuilder sb = new StringBuilder("EDGE_SE3:QUAT ");
        sb.append(vertexId(c.matchSequence(), c.matchFrame())).append(' ')
                .append(vertexId(c.querySequence(), c.queryFrame()));
        for (double v : c.translation()) {
            sb.append(' ').append(num(v));
        }
        for (double v : c.quaternion()) {
            sb.append(' ').append(num(v));
        }
        for (int r = 0; r < 6; r++) {
            for (int k = r; k < 6; k++) {
                sb.append(' ').append(num(c.information()[r * 6 + k]));
            }
        }
        return sb.toString();
    }

    private static void array(ArrayNode node, double[] values) {
        for (double v : values) {
            node.add(v);
        }
    }

    private static String num(double v) {
        return Double.toString(v);
    }

    private static String csvText(String s) {
        if (s.indexOf(',') < 0 && s.indexOf('"') < 0 && s.indexOf('\n') < 0) {
            return s;
        }
        return '"' + s.replace("\"", "\"\"") + '"';
    }

    private static void line(OutputStream out, String text) throws IOException {
        out.write(text.getBytes(StandardCharsets.UTF_8));
        out.write('\n');
    }
}
