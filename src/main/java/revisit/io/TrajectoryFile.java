package revisit.io;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Reads and writes the plain trajectory text format (documented in docs/FORMAT-trajectory.md).
 *
 * <pre>
 * # revisit-trajectory 1
 * # time x y z qx qy qz qw
 * 0.000 0.0 0.0 0.0 0 0 0 1
 * </pre>
 * One pose per line, eight numbers separated by blanks; '#' starts a comment; times strictly increase. The first
 * line must be the header so that a file of another kind is refused rather than misread.
 */
public final class TrajectoryFile {

    /** First line of every trajectory file. */
    public static final String HEADER = "# revisit-trajectory 1";

    private TrajectoryFile() {
    }

    /**
     * Reads a trajectory.
     *
     * @param file the text file
     * @return poses in file order, never empty
     * @throws BadInputException with the file and line number when a line is malformed
     */
    public static List<StampedPose> read(Path file) {
        List<String> lines;
        try {
            lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            throw new BadInputException(file + ": trajectory file not found; check the path");
        } catch (IOException e) {
            throw new BadInputException(file + ": cannot read trajectory (" + e.getMessage() + ")", e);
        }
        if (lines.isEmpty() || !lines.get(0).strip().equals(HEADER)) {
            throw new BadInputException(file + ":1: not a trajectory file, expected first line '" + HEADER
                    + "'; see docs/FORMAT-trajectory.md");
        }
        List<StampedPose> poses = new ArrayList<>();
        for (int i = 1; i < lines.size(); i++) {
            String line = lines.get(i).strip();
            if (line.isEmpty() || line.startsWith("#")) {
                continue;
            }
            StampedPose pose = parseLine(file, i + 1, line);
            if (!poses.isEmpty() && pose.timeSeconds() <= poses.get(poses.size() - 1).timeSeconds()) {
                throw new BadInputException(file + ":" + (i + 1) + ": time " + pose.timeSeconds()
                        + " does not increase; sort the poses by time and remove duplicates");
            }
            poses.add(pose);
        }
        if (poses.isEmpty()) {
            throw new BadInputException(file + ": trajectory holds no poses; add lines 'time x y z qx qy qz qw'");
        }
        return poses;
    }

    private static StampedPose parseLine(Path file, int lineNumber, String line) {
        String[] f = line.split("\\s+");
        if (f.length != 8) {
            throw new BadInputException(file + ":" + lineNumber + ": expected 8 numbers 'time x y z qx qy qz qw', found "
                    + f.length + " fields");
        }
        double[] v = new double[8];
        for (int k = 0; k < 8; k++) {
            try {
                v[k] = Double.parseDouble(f[k]);
            } catch (NumberFormatException e) {
                throw new BadInputException(file + ":" + lineNumber + ": field " + (k + 1) + " '" + f[k]
                        + "' is not a number");
            }
        }
        try {
            return new StampedPose(v[0], v[1], v[2], v[3], v[4], v[5], v[6], v[7]);
        } catch (IllegalArgumentException e) {
            throw new BadInputException(file + ":" + lineNumber + ": " + e.getMessage()
                    + "; write a unit quaternion qx qy qz qw");
        }
    }

    /**
     * Writes a trajectory atomically.
     *
     * @param file  target file
     * @param poses poses in increasing time
     */
    public static void write(Path file, List<StampedPose> poses) {
        StringBuilder sb = new StringBuilder(HEADER).append('\n').append("# time x y z qx qy qz qw\n");
        for (StampedPose p : poses) {
            sb.append(String.format(Locale.ROOT, "%.6f %.9g %.9g %.9g %.9g %.9g %.9g %.9g%n", p.timeSeconds(),
                    p.x(), p.y(), p.z(), p.qx(), p.qy(), p.qz(), p.qw()));
        }
        AtomicFiles.writeString(file, sb.toString());
    }
}
