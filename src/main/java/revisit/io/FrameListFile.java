package revisit.io;

import java.io.IOException;
import java.math.BigDecimal;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.regex.Pattern;

/**
 * Frame-list files: our own UTF-8 text format naming one image per line with its time (see
 * {@code docs/FORMAT-frames.md}).
 *
 * <pre>
 * # revisit-frames 1
 * # any comment line
 * 0.000 images/0001.png
 * 0.105 /data/run7/0002.png
 * </pre>
 *
 * The first line is the header {@value #HEADER_PREFIX} followed by the version. Each frame line is a time in
 * seconds (plain decimal, &gt;= 0, strictly increasing down the file), white space, and the image path to the end
 * of the line (it may contain spaces); relative paths are resolved against the list file's folder. Blank lines
 * and lines starting with {@code #} are ignored.
 */
public final class FrameListFile {

    /** The header up to the version number. */
    public static final String HEADER_PREFIX = "# revisit-frames ";
    /** Version written by {@link #write} and the newest {@link #read} accepts. */
    public static final int VERSION = 1;

    /** Largest frame list read, bytes: 256 MiB, several million frames; keeps a wrong file from filling memory. */
    static final long MAX_BYTES = 256L << 20;

    private static final Pattern DECIMAL = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");
    private static final String LINE_SHAPE = "write '<seconds> <image path>'";

    /**
     * One listed frame.
     *
     * @param timeSeconds time of the frame, seconds, finite and &gt;= 0
     * @param image       image path; {@link #read} returns absolute normalised paths
     */
    public record Entry(double timeSeconds, Path image) {
        public Entry {
            Objects.requireNonNull(image, "image");
        }
    }

    private FrameListFile() {
    }

    /**
     * Reads and checks a frame list: header, every line's shape, increasing times, and that each image exists.
     *
     * @return the entries in file order with absolute image paths; never empty
     * @throws BadInputException naming the file and line of the first problem
     */
    public static List<Entry> read(Path listFile) {
        List<String> lines = readLines(listFile);
        Path folder = listFile.toAbsolutePath().normalize().getParent();
        checkHeader(listFile, lines);
        List<Entry> entries = new ArrayList<>();
        int previousLine = 0;
        for (int i = 1; i < lines.size(); i++) {
            String line = lines.get(i).strip();
            if (line.isEmpty() || line.startsWith("#")) {
                continue;
            }
            Entry entry = parseLine(listFile, i + 1, line, folder);
            if (!entries.isEmpty() && !(entry.timeSeconds() > entries.get(entries.size() - 1).timeSeconds())) {
                throw new BadInputException(listFile + ": line " + (i + 1) + ": time " + entry.timeSeconds()
                        + " s is not after " + entries.get(entries.size() - 1).timeSeconds() + " s on line "
                        + previousLine + "; times must increase strictly down the file: sort the lines or fix "
                        + "the times");
            }
            entries.add(entry);
            previousLine = i + 1;
        }
        if (entries.isEmpty()) {
            throw new BadInputException(listFile + ": no frames listed; add lines '<seconds> <image path>' "
                    + "after the header");
        }
        return entries;
    }

    /**
     * Writes a frame list atomically. Images under the list file's folder are written relative to it, others
     * absolute; separators are always '/'.
     *
     * @param listFile file to create or replace
     * @param entries  frames with finite times &gt;= 0, strictly increasing
     * @throws IllegalArgumentException when times are not increasing or a path cannot be written on one line
     */
    public static void write(Path listFile, List<Entry> entries) {
        Path folder = listFile.toAbsolutePath().normalize().getParent();
        StringBuilder text = new StringBuilder(HEADER_PREFIX).append(VERSION).append('\n');
        text.append("# <time in seconds> <image path>; relative paths start at this file's folder\n");
        double previous = Double.NEGATIVE_INFINITY;
        for (Entry entry : entries) {
            double t = entry.timeSeconds();
            if (!Double.isFinite(t) || t < 0 || !(t > previous)) {
                throw new IllegalArgumentException("frame times must be finite, >= 0 and strictly increasing; "
                        + t + " follows " + previous + " for " + entry.image());
            }
            String path = pathText(folder, entry.image());
            text.append(BigDecimal.valueOf(t).toPlainString()).append(' ').append(path).append('\n');
            previous = t;
        }
        AtomicFiles.writeString(listFile, text.toString());
    }

    private static List<String> readLines(Path listFile) {
        if (!Files.isRegularFile(listFile)) {
            throw new BadInputException(listFile + ": frame list not found; check the path");
        }
        try {
            if (Files.size(listFile) > MAX_BYTES) {
                throw new BadInputException(listFile + ": " + Files.size(listFile) + " bytes, too large for a frame "
                        + "list (limit " + MAX_BYTES + "); check that this is the frame list, or split it");
            }
            List<String> lines = new ArrayList<>(Files.readAllLines(listFile, StandardCharsets.UTF_8));
            if (!lines.isEmpty()) {
                lines.set(0, stripBom(lines.get(0)));
            }
            return lines;
        } catch (CharacterCodingException e) {
            throw new BadInputException(listFile + ": not UTF-8 text; save the frame list as UTF-8", e);
        } catch (IOException e) {
            throw new BadInputException(listFile + ": frame list cannot be read (" + ImageFiles.oneLine(e)
                    + "); check the file's permissions", e);
        }
    }

    private static void checkHeader(Path listFile, List<String> lines) {
        String expected = HEADER_PREFIX + VERSION;
        String first = lines.isEmpty() ? "" : lines.get(0).strip();
        if (!first.startsWith(HEADER_PREFIX.strip())) {
            throw new BadInputException(listFile + ": line 1: missing header '" + expected + "' (found '"
                    + abbreviate(first) + "'); add it as the first line");
        }
        String version = first.substring(HEADER_PREFIX.strip().length()).strip();
        if (!version.matches("\\d{1,9}")) {
            throw new BadInputException(listFile + ": line 1: header version '" + abbreviate(version)
                    + "' is not a whole number; the first line must be '" + expected + "'");
        }
        int number = Integer.parseInt(version);
        if (number < 1 || number > VERSION) {
            throw new BadInputException(listFile + ": line 1: frame-list version " + number + " is not one this "
                    + "Revisit reads (1.." + VERSION + "); update Revisit or rewrite the list as version " + VERSION);
        }
    }

    private static Entry parseLine(Path listFile, int lineNumber, String line, Path folder) {
        String where = listFile + ": line " + lineNumber + ": ";
        String[] parts = line.split("\\s+", 2);
        if (!DECIMAL.matcher(parts[0]).matches()) {
            throw new BadInputException(where + "time '" + abbreviate(parts[0]) + "' is not a decimal number of "
                    + "seconds; " + LINE_SHAPE);
        }
        double time = Double.parseDouble(parts[0]);
        if (!Double.isFinite(time) || time < 0) {
            throw new BadInputException(where + "time " + parts[0] + " is negative or out of range; times are "
                    + "seconds >= 0");
        }
        if (parts.length < 2 || parts[1].isBlank()) {
            throw new BadInputException(where + "no image path after the time; " + LINE_SHAPE);
        }
        Path image = resolve(where, folder, parts[1].strip());
        if (!Files.isRegularFile(image)) {
            throw new BadInputException(where + "image '" + parts[1].strip() + "' not found (looked for " + image
                    + "); fix the path or remove the line");
        }
        return new Entry(time, image);
    }

    private static Path resolve(String where, Path folder, String text) {
        try {
            return folder.resolve(text).normalize();
        } catch (java.nio.file.InvalidPathException e) {
            throw new BadInputException(where + "image path '" + abbreviate(text) + "' is not a valid path ("
                    + e.getReason() + "); fix the path", e);
        }
    }

    private static String pathText(Path folder, Path image) {
        Path absolute = folder.resolve(image).normalize();
        Path shown = absolute.startsWith(folder) ? folder.relativize(absolute) : absolute;
        String text = shown.toString().replace(shown.getFileSystem().getSeparator(), "/");
        if (text.isEmpty() || !text.equals(text.strip()) || text.contains("\n") || text.contains("\r")) {
            throw new IllegalArgumentException("image path cannot be written on one frame-list line: '"
                    + text + "'");
        }
        return text;
    }

    private static String stripBom(String line) {
        return line.startsWith("\uFEFF") ? line.substring(1) : line;
    }

    private static String abbreviate(String text) {
        return text.length() <= 40 ? text : text.substring(0, 37) + "...";
    }
}
