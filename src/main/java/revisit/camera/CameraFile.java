package revisit.camera;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.List;
import revisit.io.AtomicFiles;
import revisit.io.BadInputException;

/**
 * Reads and writes the camera file, a small JSON document of our own (docs/FORMAT-camera.md):
 *
 * <pre>
 * {"format": "revisit-camera", "version": 1, "model": "pinhole-radtan",
 *  "width": 640, "height": 480, "fx": 500, "fy": 500, "skew": 0, "cx": 320, "cy": 240,
 *  "k1": 0, "k2": 0, "k3": 0, "p1": 0, "p2": 0}
 * </pre>
 * Distortion keys may be omitted (then 0). Unknown keys are refused so that a typo is not silently ignored.
 */
public final class CameraFile {

    /** Value of the "format" field. */
    public static final String FORMAT = "revisit-camera";
    /** Current version. */
    public static final int VERSION = 1;
    /** The only model kind so far. */
    public static final String MODEL = "pinhole-radtan";

    private static final List<String> REQUIRED = List.of("width", "height", "fx", "fy", "cx", "cy");
    private static final List<String> OPTIONAL = List.of("skew", "k1", "k2", "k3", "p1", "p2");
    private static final ObjectMapper JSON = new ObjectMapper();

    private CameraFile() {
    }

    /**
     * Reads and validates a camera file.
     *
     * @throws BadInputException naming the file, the field and the fix
     */
    public static CameraModel read(Path file) {
        JsonNode root = parse(file);
        checkHeader(file, root);
        root.fieldNames().forEachRemaining(name -> {
            if (!REQUIRED.contains(name) && !OPTIONAL.contains(name)
                    && !List.of("format", "version", "model").contains(name)) {
                throw new BadInputException(file + ": unknown field '" + name + "'; allowed: format, version, model, "
                        + String.join(", ", REQUIRED) + ", " + String.join(", ", OPTIONAL));
            }
        });
        double[] req = new double[REQUIRED.size()];
        for (int i = 0; i < req.length; i++) {
            req[i] = number(file, root, REQUIRED.get(i), true);
        }
        double[] opt = new double[OPTIONAL.size()];
        for (int i = 0; i < opt.length; i++) {
            opt[i] = number(file, root, OPTIONAL.get(i), false);
        }
        if (req[0] != Math.rint(req[0]) || req[1] != Math.rint(req[1])) {
            throw new BadInputException(file + ": width and height must be whole pixels, were " + req[0] + ", " + req[1]);
        }
        try {
            return new CameraModel((int) req[0], (int) req[1], req[2], req[3], opt[0], req[4], req[5],
                    opt[1], opt[2], opt[3], opt[4], opt[5]);
        } catch (IllegalArgumentException e) {
            throw new BadInputException(file + ": " + e.getMessage() + "; fix the calibration values");
        }
    }

    private static JsonNode parse(Path file) {
        try {
            return JSON.readTree(Files.readString(file));
        } catch (NoSuchFileException e) {
            throw new BadInputException(file + ": camera file not found; check the path");
        } catch (JsonProcessingException e) {
            throw new BadInputException(file + ": not valid JSON at line " + e.getLocation().getLineNr()
                    + "; see docs/FORMAT-camera.md", e);
        } catch (IOException e) {
            throw new BadInputException(file + ": cannot read camera file (" + e.getMessage() + ")", e);
        }
    }

    private static void checkHeader(Path file, JsonNode root) {
        if (root == null || !root.isObject()) {
            throw new BadInputException(file + ": camera file must be one JSON object; see docs/FORMAT-camera.md");
        }
        if (!FORMAT.equals(root.path("format").asText())) {
            throw new BadInputException(file + ": \"format\" must be \"" + FORMAT + "\"; this is not a camera file"
                    + " of ours (see docs/FORMAT-camera.md)");
        }
        if (root.path("version").asInt(-1) != VERSION) {
            throw new BadInputException(file + ": camera file version " + root.path("version")
                    + " is not supported, expected " + VERSION);
        }
        if (!MODEL.equals(root.path("model").asText(MODEL))) {
            throw new BadInputException(file + ": model '" + root.path("model").asText() + "' unknown, expected '"
                    + MODEL + "'");
        }
    }

    private static double number(Path file, JsonNode root, String name, boolean required) {
        JsonNode n = root.get(name);
        if (n == null) {
            if (required) {
                throw new BadInputException(file + ": missing field '" + name + "'; see docs/FORMAT-camera.md");
            }
            return 0;
        }
        if (!n.isNumber()) {
            throw new BadInputException(file + ": field '" + name + "' must be a number, was " + n);
        }
        return n.asDouble();
    }

    /** Writes a camera file atomically. */
    public static void write(Path file, CameraModel c) {
        ObjectNode o = JSON.createObjectNode();
        o.put("format", FORMAT).put("version", VERSION).put("model", MODEL);
        o.put("width", c.width()).put("height", c.height());
        o.put("fx", c.fx()).put("fy", c.fy()).put("skew", c.skew()).put("cx", c.cx()).put("cy", c.cy());
        o.put("k1", c.k1()).put("k2", c.k2()).put("k3", c.k3()).put("p1", c.p1()).put("p2", c.p2());
        try {
            AtomicFiles.writeString(file, JSON.writerWithDefaultPrettyPrinter().writeValueAsString(o) + "\n");
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("camera JSON could not be formed", e);
        }
    }
}
