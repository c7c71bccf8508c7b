package revisit.pipeline;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalInt;
import java.util.TreeMap;
import revisit.io.BadInputException;

/** Reads back the per-query traces a scan wrote ({@link ScanOutputs#TRACES}, docs/FORMAT-closures.md). */
public final class TraceFile {

    /** Traces and the names of the sequences they refer to (index = sequence id). */
    public record Contents(List<QueryTrace> traces, List<String> sequenceNames) {
    }

    private TraceFile() {
    }

    /** Reads a traces file. */
    public static Contents read(Path file) {
        List<String> lines;
        try {
            lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            throw new BadInputException(file + ": query traces not found; point at the output folder of a scan");
        } catch (IOException e) {
            throw new BadInputException(file + ": cannot read query traces (" + e.getMessage() + ")", e);
        }
        if (lines.size() < 2 || !lines.get(0).equals("# revisit-queries 1")) {
            throw new BadInputException(file + ":1: not a query-traces file (expected '# revisit-queries 1')");
        }
        List<QueryTrace> traces = new ArrayList<>();
        TreeMap<Integer, String> names = new TreeMap<>();
        for (int i = 2; i < lines.size(); i++) {
            if (lines.get(i).isBlank()) {
                continue;
            }
            List<String> f = splitCsv(lines.get(i));
            if (f.size() != 10) {
                throw new BadInputException(file + ":" + (i + 1) + ": expected 10 fields, found " + f.size());
            }
            try {
                int seq = Integer.parseInt(f.get(0));
                names.put(seq, f.get(1));
                traces.add(new QueryTrace(seq, Integer.parseInt(f.get(2)), Double.parseDouble(f.get(3)),
                        QueryStage.valueOf(f.get(4).toUpperCase(Locale.ROOT)), Integer.parseInt(f.get(5)),
                        Integer.parseInt(f.get(6)), Double.parseDouble(f.get(7)),
                        f.get(8).isEmpty() ? OptionalInt.empty() : OptionalInt.of(Integer.parseInt(f.get(8))),
                        f.get(9)));
            } catch (IllegalArgumentException e) {
                throw new BadInputException(file + ":" + (i + 1) + ": malformed field (" + e.getMessage()
                        + "); the file was not written by revisit scan", e);
            }
        }
        List<String> nameList = new ArrayList<>();
        for (int s = 0; s <= (names.isEmpty() ? -1 : names.lastKey()); s++) {
            nameList.add(names.getOrDefault(s, "sequence" + s));
        }
        return new Contents(traces, nameList);
    }

    private static List<String> splitCsv(String line) {
        List<String> out = new ArrayList<>();
        StringBuilder cur = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < line.length(); i++) {
            char ch = line.charAt(i);
            if (quoted) {
                if (ch == '"' && i + 1 < line.length() && line.charAt(i + 1) == '"') {
                    cur.append('"');
                    i++;
                } else if (ch == '"') {
                    quoted = false;
                } else {
                    cur.append(ch);
                }
            } else if (ch == '"') {
                quoted = true;
            } else if (ch == ',') {
                out.add(cur.toString());
                cur.setLength(0);
            } else {
                cur.append(ch);
            }
        }
        out.add(cur.toString());
        return out;
    }
}
