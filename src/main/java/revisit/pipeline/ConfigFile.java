package revisit.pipeline;

import com.fasterxml.jackson.annotation.JsonAutoDetect;
import com.fasterxml.jackson.annotation.PropertyAccessor;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Iterator;
import java.util.Map;
import revisit.io.AtomicFiles;
import revisit.io.BadInputException;

/**
 * The configuration file: JSON {@code {"format": "revisit-config", "version": 1, "features": {...}, "index":
 * {...}, "verification": {...}, "scan": {...}}} (docs/FORMAT-config.md). A file may hold only some sections or
 * fields; the rest keep their defaults. Unknown fields are refused, values are validated by the records.
 */
public final class ConfigFile {

    /** Value of the "format" field. */
    public static final String FORMAT = "revisit-config";
    /** Current version. */
    public static final int VERSION = 1;

    /** Field name of the inlier-ratio bar, formerly also in the scan section. */
    private static final String RATIO = "minInlierRatio";

    private static final ObjectMapper JSON = new ObjectMapper()
            .setVisibility(PropertyAccessor.ALL, JsonAutoDetect.Visibility.NONE)
            .setVisibility(PropertyAccessor.FIELD, JsonAutoDetect.Visibility.ANY)
            .setVisibility(PropertyAccessor.CREATOR, JsonAutoDetect.Visibility.ANY)
            .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
            .enable(DeserializationFeature.FAIL_ON_NULL_FOR_PRIMITIVES);

    private ConfigFile() {
    }

    /** Reads a configuration file over the defaults. */
    public static ScanConfig read(Path file) {
        return read(file, ScanConfig.defaults());
    }

    /**
     * Reads a configuration file over a base configuration.
     *
     * @throws BadInputException naming the file, the field and the fix
     */
    public static ScanConfig read(Path file, ScanConfig base) {
        JsonNode user;
        try {
            user = JSON.readTree(Files.readString(file));
        } catch (NoSuchFileException e) {
            throw new BadInputException(file + ": configuration file not found; check the path");
        } catch (JsonProcessingException e) {
            throw new BadInputException(file + ": not valid JSON at line " + e.getLocation().getLineNr()
                    + "; see docs/FORMAT-config.md", e);
        } catch (IOException e) {
            throw new BadInputException(file + ": cannot read configuration (" + e.getMessage() + ")", e);
        }
        if (user == null || !user.isObject() || !FORMAT.equals(user.path("format").asText())) {
            throw new BadInputException(file + ": not a revisit configuration (expected \"format\": \"" + FORMAT
                    + "\"); see docs/FORMAT-config.md");
        }
        if (user.path("version").asInt(-1) != VERSION) {
            throw new BadInputException(file + ": configuration version " + user.path("version")
                    + " is not supported, expected " + VERSION);
        }
        ObjectNode merged = toTree(base);
        ObjectNode body = ((ObjectNode) user).deepCopy();
        body.remove("format");
        body.remove("version");
        body.remove("comment");
        moveFormerInlierRatio(body);
        merge(file, merged, body, "");
        try {
            return JSON.treeToValue(merged, ScanConfig.class);
        } catch (JsonProcessingException e) {
            String why = e.getCause() != null && e.getCause().getMessage() != null
                    ? e.getCause().getMessage() : e.getOriginalMessage();
            throw new BadInputException(file + ": " + why + "; fix the value (see docs/FORMAT-config.md)", e);
        }
    }

    /**
     * Applies command-line overrides {@code section.field=value} (e.g. {@code index.exclusionSeconds=10}).
     *
     * @throws BadInputException naming the override and the fix
     */
    public static ScanConfig override(ScanConfig base, java.util.List<String> assignments) {
        if (assignments.isEmpty()) {
            return base;
        }
        ObjectNode merged = toTree(base);
        for (String a : assignments) {
            int eq = a.indexOf('=');
            int dot = a.indexOf('.');
            if (eq < 0 || dot < 0 || dot > eq) {
                throw new BadInputException("--set " + a + ": expected section.field=value, e.g."
                        + " index.exclusionSeconds=10");
            }
            String section = RATIO.equals(a.substring(dot + 1, eq)) && "scan".equals(a.substring(0, dot))
                    ? "verification" : a.substring(0, dot);
            String field = a.substring(dot + 1, eq);
            String text = a.substring(eq + 1);
            JsonNode sec = merged.get(section);
            if (sec == null || !sec.isObject() || !sec.has(field)) {
                throw new BadInputException("--set " + a + ": unknown setting '" + section + "." + field
                        + "'; see docs/FORMAT-config.md for the names");
            }
            JsonNode value = sec.get(field).isTextual() ? merged.textNode(text) : parseScalar(a, text);
            ((ObjectNode) sec).set(field, value);
        }
        try {
            return JSON.treeToValue(merged, ScanConfig.class);
        } catch (JsonProcessingException e) {
            String why = e.getCause() != null && e.getCause().getMessage() != null
                    ? e.getCause().getMessage() : e.getOriginalMessage();
            throw new BadInputException("--set: " + why, e);
        }
    }

    /**
     * Files written before the inlier-ratio bar was unified hold it twice, {@code scan.minInlierRatio} beside
     * {@code verification.minInlierRatio}, and both applied; the bar is now the verification field alone, set to
     * the larger of the two (the one that decided), so an old file keeps its meaning.
     */
    private static void moveFormerInlierRatio(ObjectNode body) {
        JsonNode scan = body.get("scan");
        if (scan == null || !scan.isObject() || !scan.has(RATIO)) {
            return;
        }
        JsonNode former = ((ObjectNode) scan).remove(RATIO);
        JsonNode verification = body.has("verification") ? body.get("verification") : body.putObject("verification");
        if (!verification.isObject()) {
            return;
        }
        JsonNode current = verification.get(RATIO);
        boolean currentDecides = current != null && current.isNumber() && former.isNumber()
                && current.asDouble() > former.asDouble();
        ((ObjectNode) verification).set(RATIO, currentDecides ? current : former);
    }

    private static JsonNode parseScalar(String assignment, String text) {
        try {
            return JSON.readTree(text);
        } catch (JsonProcessingException e) {
            throw new BadInputException("--set " + assignment + ": '" + text + "' is not a number or true/false", e);
        }
    }

    /** The configuration as a JSON tree with format and version fields. */
    public static ObjectNode toTree(ScanConfig config) {
        return JSON.valueToTree(config);
    }

    /** Writes a complete configuration file atomically. */
    public static void write(Path file, ScanConfig config, String comment) {
        ObjectNode root = JSON.createObjectNode();
        root.put("format", FORMAT).put("version", VERSION);
        if (!comment.isEmpty()) {
            root.put("comment", comment);
        }
        root.setAll(toTree(config));
        try {
            AtomicFiles.writeString(file, JSON.writerWithDefaultPrettyPrinter().writeValueAsString(root) + "\n");
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("configuration JSON could not be formed", e);
        }
    }

    private static void merge(Path file, ObjectNode target, JsonNode source, String path) {
        Iterator<Map.Entry<String, JsonNode>> it = source.fields();
        while (it.hasNext()) {
            Map.Entry<String, JsonNode> e = it.next();
            String name = path.isEmpty() ? e.getKey() : path + "." + e.getKey();
            JsonNode existing = target.get(e.getKey());
            if (existing == null) {
                throw new BadInputException(file + ": unknown setting '" + name + "'; see docs/FORMAT-config.md"
                        + " for the names");
            }
            if (existing.isObject()) {
                if (!e.getValue().isObject()) {
                    throw new BadInputException(file + ": '" + name + "' must be an object");
                }
                merge(file, (ObjectNode) existing, e.getValue(), name);
            } else {
                target.set(e.getKey(), e.getValue());
            }
        }
    }
}
