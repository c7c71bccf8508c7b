package revisit.evaluation;

import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import revisit.io.BadInputException;

/** Parses one body line of a pairs file into two frame ranges given as global indices. */
final class PairsLineParser {

    /** What the numbers of a pairs file mean. */
    enum Unit { FRAMES, SECONDS }

    /** One parsed line: an inclusive range of query frames and one of match frames, global indices. */
    record Line(int queryFirst, int queryLast, int matchFirst, int matchLast) {
        int queryCount() {
            return queryLast - queryFirst + 1;
        }

        int matchCount() {
            return matchLast - matchFirst + 1;
        }
    }

    private static final String FRAME = "[0-9]+";
    private static final String TIME = "[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+";
    private static final Pattern FIELD = Pattern.compile("(?:([^:\\s]+):)?([^:\\s-]+)(?:-([^:\\s-]+))?");

    private final Path file;
    private final FrameTimeline timeline;
    private final Unit unit;

    PairsLineParser(Path file, FrameTimeline timeline, Unit unit) {
        this.file = file;
        this.timeline = timeline;
        this.unit = unit;
    }

    Line parse(int lineNumber, String line) {
        String[] f = line.split("\\s+");
        if (f.length != 2) {
            throw bad(lineNumber, "expected 2 fields 'query match', found " + f.length
                    + "; write e.g. '812 40' or '900-910 95-101'");
        }
        int[] q = range(lineNumber, f[0]);
        int[] m = range(lineNumber, f[1]);
        if (q[0] == q[1] && m[0] == m[1] && q[0] == m[0]) {
            throw bad(lineNumber, "query and match are the same frame (" + timeline.keyOf(q[0])
                    + "); a frame cannot revisit itself");
        }
        return new Line(q[0], q[1], m[0], m[1]);
    }

    private int[] range(int lineNumber, String field) {
        Matcher mt = FIELD.matcher(field);
        if (!mt.matches()) {
            throw bad(lineNumber, "cannot read '" + field + "'; write VALUE, FIRST-LAST or SEQUENCE:VALUE");
        }
        SequenceFrames seq = sequence(lineNumber, mt.group(1));
        int first = frame(lineNumber, seq, mt.group(2));
        int last = mt.group(3) == null ? first : frame(lineNumber, seq, mt.group(3));
        if (last < first) {
            throw bad(lineNumber, "interval '" + field + "' runs backwards; write the smaller value first");
        }
        int base = timeline.globalIndex(new FrameKey(seq.sequenceId(), 0));
        return new int[]{base + first, base + last};
    }

    private SequenceFrames sequence(int lineNumber, String id) {
        if (id == null) {
            if (timeline.sequences().size() != 1) {
                throw bad(lineNumber, "the scan holds several sequences " + timeline.sequenceIds()
                        + "; name the sequence as SEQUENCE:VALUE");
            }
            return timeline.sequences().get(0);
        }
        return timeline.sequence(id).orElseThrow(() -> bad(lineNumber, "unknown sequence '" + id
                + "'; the scan holds " + timeline.sequenceIds()));
    }

    private int frame(int lineNumber, SequenceFrames seq, String value) {
        return unit == Unit.FRAMES ? frameNumber(lineNumber, seq, value) : frameAtTime(lineNumber, seq, value);
    }

    private int frameNumber(int lineNumber, SequenceFrames seq, String value) {
        if (!value.matches(FRAME)) {
            throw bad(lineNumber, "'" + value + "' is not a frame number (a whole number >= 0)"
                    + (value.matches(TIME) ? "; for times write 'seconds' in the header" : ""));
        }
        long frame = value.length() > 10 ? Long.MAX_VALUE : Long.parseLong(value);
        if (frame >= seq.size()) {
            throw bad(lineNumber, "frame " + value + " is past the end of sequence '" + seq.sequenceId()
                    + "' (" + seq.size() + " frames, numbered from 0); check the labels belong to this scan");
        }
        return (int) frame;
    }

    private int frameAtTime(int lineNumber, SequenceFrames seq, String value) {
        if (!value.matches(TIME)) {
            throw bad(lineNumber, "'" + value + "' is not a time in seconds (a decimal number >= 0)");
        }
        double t = Double.parseDouble(value);
        int frame = seq.nearestFrame(t);
        double tolerance = 0.5 * seq.medianIntervalSeconds() + 1e-9;
        double gap = Math.abs(seq.timeOf(frame) - t);
        if (gap > tolerance) {
            throw bad(lineNumber, "time " + value + " s is " + gap + " s from the nearest frame of sequence '"
                    + seq.sequenceId() + "' (allowed " + tolerance + " s, half the frame interval); check the"
                    + " times use the scan's clock");
        }
        return frame;
    }

    private BadInputException bad(int lineNumber, String what) {
        return new BadInputException(file + ":" + lineNumber + ": " + what);
    }
}
