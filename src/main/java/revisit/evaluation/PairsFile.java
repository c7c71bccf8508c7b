package revisit.evaluation;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.List;
import revisit.io.AtomicFiles;
import revisit.io.BadInputException;

/**
 * Reads and writes the revisit pairs file, our own text format for labelled revisits (docs/FORMAT-labels.md).
 *
 * <pre>
 * # revisit-pairs 1 frames
 * 812 40            frame 812 revisits frame 40
 * 900-910 95-101    every frame of 900..910 revisits every frame of 95..101
 * hall:30 yard:7    with sequence ids (required when the scan holds several sequences)
 * </pre>
 * With {@code seconds} instead of {@code frames} in the header, values are times in seconds, each snapped to the
 * nearest frame. Pairs are unordered (the later frame becomes the query); pairs inside the exclusion window are
 * dropped and counted, because the detector may not report them.
 */
public final class PairsFile {

    /** Magic start of the first line. */
    public static final String MAGIC = "# revisit-pairs 1";

    private PairsFile() {
    }

    /**
     * Reads labelled pairs into labels over a timeline.
     *
     * @param file     the pairs file
     * @param timeline frames of the scan the labels belong to
     * @param window   exclusion window applied to the pairs (the detector's window)
     * @throws BadInputException with file and line number on any malformed line
     */
    public static RevisitLabels read(Path file, FrameTimeline timeline, ExclusionWindow window) {
        return read(file, timeline, window, LabelBuilder.DEFAULT_MAX_PAIRS);
    }

    /** As {@link #read(Path, FrameTimeline, ExclusionWindow)} with a cap on expanded pairs. */
    public static RevisitLabels read(Path file, FrameTimeline timeline, ExclusionWindow window, long maxPairs) {
        List<String> lines = readLines(file);
        PairsLineParser parser = new PairsLineParser(file, timeline, unitOf(file, lines));
        LabelBuilder builder = new LabelBuilder(timeline, window, maxPairs);
        for (int i = 1; i < lines.size(); i++) {
            String line = stripComment(lines.get(i));
            if (!line.isEmpty()) {
                addLine(builder, parser.parse(i + 1, line), file, i + 1, maxPairs);
            }
        }
        return builder.build();
    }

    private static void addLine(LabelBuilder builder, PairsLineParser.Line parsed, Path file, int lineNumber,
                                long maxPairs) {
        long product = (long) parsed.queryCount() * parsed.matchCount();
        if (product > maxPairs) {
            throw new BadInputException(file + ":" + lineNumber + ": this line expands to " + product
                    + " pairs, more than the limit of " + maxPairs + "; split the intervals or check them");
        }
        try {
            for (int q = parsed.queryFirst(); q <= parsed.queryLast(); q++) {
                for (int m = parsed.matchFirst(); m <= parsed.matchLast(); m++) {
                    builder.add(q, m);
                }
            }
        } catch (LabelBuilder.LabelLimitException e) {
            throw new BadInputException(file + ":" + lineNumber + ": labels exceed " + maxPairs
                    + " pairs; use smaller intervals", e);
        }
    }

    private static List<String> readLines(Path file) {
        try {
            return Files.readAllLines(file, StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            throw new BadInputException(file + ": pairs file not found; check the path", e);
        } catch (IOException e) {
            throw new BadInputException(file + ": cannot read pairs file (" + e.getMessage()
                    + "); check it is UTF-8 text and readable", e);
        }
    }

    private static PairsLineParser.Unit unitOf(Path file, List<String> lines) {
        String first = lines.isEmpty() ? "" : lines.get(0).strip();
        String[] f = first.split("\\s+");
        boolean magic = f.length >= 3 && (f[0] + " " + f[1] + " " + f[2]).equals(MAGIC);
        if (!magic || f.length > 4) {
            throw new BadInputException(file + ":1: not a revisit pairs file, expected first line '" + MAGIC
                    + " frames' or '" + MAGIC + " seconds'; see docs/FORMAT-labels.md");
        }
        if (f.length == 3 || f[3].equals("frames")) {
            return PairsLineParser.Unit.FRAMES;
        }
        if (f[3].equals("seconds")) {
            return PairsLineParser.Unit.SECONDS;
        }
        throw new BadInputException(file + ":1: unknown unit '" + f[3] + "' in the header; write 'frames' or 'seconds'");
    }

    private static String stripComment(String line) {
        int hash = line.indexOf('#');
        return (hash >= 0 ? line.substring(0, hash) : line).strip();
    }

    /**
     * Writes labels as frame pairs, one kept pair per line; sequence ids are written when the timeline holds more
     * than one sequence. Reading the file back with the same timeline and window gives the same labels.
     */
    public static void write(Path file, RevisitLabels labels) {
        boolean ids = labels.timeline().sequences().size() > 1;
        StringBuilder sb = new StringBuilder(MAGIC).append(" frames\n# query match\n");
        for (RevisitPair pair : labels.pairs()) {
            sb.append(ids ? pair.query().toString() : Integer.toString(pair.query().frame())).append(' ')
                    .append(ids ? pair.match().toString() : Integer.toString(pair.match().frame())).append('\n');
        }
        AtomicFiles.writeString(file, sb.toString());
    }
}
