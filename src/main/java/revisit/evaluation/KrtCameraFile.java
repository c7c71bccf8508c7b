package revisit.evaluation;

import georegression.struct.se.Se3_F64;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import revisit.io.BadInputException;
import revisit.io.StampedPose;

/**
 * Reads the K/R/t camera text format of the Middlebury multi-view stereo data (Seitz, Curless, Diebel, Scharstein,
 * Szeliski, "A Comparison and Evaluation of Multi-View Stereo Reconstruction Algorithms", CVPR 2006).
 *
 * <pre>
 * 363
 * name.png k11 k12 k13 k21 k22 k23 k31 k32 k33 r11 r12 r13 r21 r22 r23 r31 r32 r33 t1 t2 t3
 * </pre>
 * The first line is the number of views. A world point X projects to {@code x = K [R|t] X}, so [R|t] maps world to
 * camera; the camera-to-world pose is {@code (R^T, -R^T t)}: the camera centre is {@code C = -R^T t}.
 */
public final class KrtCameraFile {

    /** Largest accepted |R R^T - I| entry; the published files hold about 1.7e-6 (measured on dino_par.txt). */
    static final double ORTHONORMAL_TOLERANCE = 1e-4;

    private KrtCameraFile() {
    }

    /**
     * Reads every view of a K/R/t file.
     *
     * @throws BadInputException with file and line number on any malformed line
     */
    public static List<KrtView> read(Path file) {
        List<String> lines;
        try {
            lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            throw new BadInputException(file + ": camera file not found; check the path", e);
        } catch (IOException e) {
            throw new BadInputException(file + ": cannot read camera file (" + e.getMessage() + ")", e);
        }
        int declared = count(file, lines);
        List<KrtView> views = new ArrayList<>(declared);
        for (int i = 1; i < lines.size(); i++) {
            String line = lines.get(i).strip();
            if (!line.isEmpty()) {
                views.add(parseView(file, i + 1, line, views.size()));
            }
        }
        if (views.size() != declared) {
            throw new BadInputException(file + ": first line declares " + declared + " views but " + views.size()
                    + " view lines follow; fix the count or restore the missing lines");
        }
        return views;
    }

    private static int count(Path file, List<String> lines) {
        String first = lines.isEmpty() ? "" : lines.get(0).strip();
        if (!first.matches("[0-9]{1,9}")) {
            throw new BadInputException(file + ":1: expected the number of views, found '" + first
                    + "'; a K/R/t camera file starts with the view count");
        }
        return Integer.parseInt(first);
    }

    private static KrtView parseView(Path file, int lineNumber, String line, int position) {
        String[] f = line.split("\\s+");
        if (f.length != 22) {
            throw new BadInputException(file + ":" + lineNumber + ": expected 22 fields 'name k11..k33 r11..r33 t1 t2 t3',"
                    + " found " + f.length);
        }
        double[] v = new double[21];
        for (int k = 0; k < 21; k++) {
            try {
                v[k] = Double.parseDouble(f[k + 1]);
            } catch (NumberFormatException e) {
                throw new BadInputException(file + ":" + lineNumber + ": field " + (k + 2) + " '" + f[k + 1]
                        + "' is not a number", e);
            }
            if (!Double.isFinite(v[k])) {
                throw new BadInputException(file + ":" + lineNumber + ": field " + (k + 2) + " is not finite");
            }
        }
        checkRotation(file, lineNumber, v);
        double[] k = Arrays.copyOfRange(v, 0, 9);
        if (!(k[0] > 0) || !(k[4] > 0) || k[3] != 0 || k[6] != 0 || k[7] != 0 || k[8] != 1) {
            throw new BadInputException(file + ":" + lineNumber + ": K is not an upper-triangular intrinsic matrix"
                    + " with positive focal lengths and k33 = 1");
        }
        return new KrtView(f[0], k, StampedPose.of(position, cameraToWorld(v)));
    }

    private static void checkRotation(Path file, int lineNumber, double[] v) {
        double worst = 0;
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                double dot = 0;
                for (int c = 0; c < 3; c++) {
                    dot += v[9 + 3 * i + c] * v[9 + 3 * j + c];
                }
                worst = Math.max(worst, Math.abs(dot - (i == j ? 1 : 0)));
            }
        }
        double det = v[9] * (v[13] * v[17] - v[14] * v[16]) - v[10] * (v[12] * v[17] - v[14] * v[15])
                + v[11] * (v[12] * v[16] - v[13] * v[15]);
        if (worst > ORTHONORMAL_TOLERANCE || det < 0) {
            throw new BadInputException(file + ":" + lineNumber + ": R is not a rotation (|R R^T - I| = " + worst
                    + ", det = " + det + "); write a proper rotation matrix row by row");
        }
    }

    /** Camera-to-world transform (R^T, -R^T t) from the world-to-camera rotation and translation in v[9..20]. */
    private static Se3_F64 cameraToWorld(double[] v) {
        Se3_F64 se = new Se3_F64();
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                se.R.set(j, i, v[9 + 3 * i + j]);
            }
        }
        double t1 = v[18];
        double t2 = v[19];
        double t3 = v[20];
        se.T.setTo(-(v[9] * t1 + v[12] * t2 + v[15] * t3), -(v[10] * t1 + v[13] * t2 + v[16] * t3),
                -(v[11] * t1 + v[14] * t2 + v[17] * t3));
        return se;
    }
}
