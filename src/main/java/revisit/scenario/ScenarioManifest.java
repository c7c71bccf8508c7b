package revisit.scenario;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

/**
 * The scenario's manifest: a small JSON document of our own ({@code "format": "revisit-scenario"}, documented in
 * docs/SCENARIO.md) naming the generator, seed and settings, the folder layout, the places, the planted visits
 * and revisits, and the twin decoys.
 */
final class ScenarioManifest {

    static final String FORMAT = "revisit-scenario";
    static final int VERSION = 1;

    private static final ObjectMapper JSON = new ObjectMapper();

    private ScenarioManifest() {
    }

    static String toJson(Scenario s) {
        ObjectNode root = JSON.createObjectNode();
        root.put("format", FORMAT).put("version", VERSION);
        root.putObject("generator").put("name", "revisit.scenario").put("version", Scenario.GENERATOR_VERSION);
        root.put("world", s.world().name()).put("seed", s.config().seed());
        root.set("config", JSON.valueToTree(s.config()));
        root.putObject("axes").put("world", "x east, y north, z up; metres; floor at z = 0")
                .put("camera", "x right, y down, z forward; poses are camera-to-world");
        root.put("camera", ScenarioWriter.CAMERA_FILE);
        root.putObject("depth").put("encoding", "16-bit grey PNG").put("kind", "z-depth along the optical axis")
                .put("unit", "millimetre").put("metresPerUnit", 0.001).put("zeroMeans", "no surface (sky)");
        sessions(s, root.putArray("sessions"));
        ArrayNode places = root.putArray("places");
        s.world().places().forEach(p -> places.add(JSON.valueToTree(p)));
        ArrayNode visits = root.putArray("visits");
        s.visits().forEach(v -> visits.add(visit(s, v)));
        plantedPairs(s, root);
        ArrayNode photos = root.putArray("photoCredits");
        s.world().photoCredits().forEach(photos::add);
        try {
            return JSON.writerWithDefaultPrettyPrinter().writeValueAsString(root) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("scenario manifest could not be formed", e);
        }
    }

    private static void sessions(Scenario s, ArrayNode sessions) {
        for (Session ses : s.sessions()) {
            ObjectNode o = sessions.addObject();
            o.put("name", ses.name()).put("frames", ses.frameCount()).put("rateHz", ses.rateHz())
                    .put("framesFolder", ses.name() + "/" + ScenarioWriter.FRAMES)
                    .put("framePattern", ScenarioWriter.FRAME_PATTERN)
                    .put("frameList", ses.name() + "/" + ScenarioWriter.FRAME_LIST)
                    .put("depthFolder", ses.name() + "/" + ScenarioWriter.DEPTH)
                    .put("depthPattern", ScenarioWriter.DEPTH_PATTERN)
                    .put("poses", ses.name() + "/" + ScenarioWriter.POSES)
                    .put("routeLengthM", round(ses.route().lengthMetres()))
                    .put("speedMetresPerSecond", round(ses.route().speed()));
            o.set("lighting", JSON.valueToTree(ses.lighting()));
        }
    }

    private static void plantedPairs(Scenario s, ObjectNode root) {
        ArrayNode revisits = root.putArray("revisits");
        for (PlantedRevisit r : s.revisits()) {
            ObjectNode o = revisits.addObject();
            o.put("place", r.place()).put("kind", r.kind()).put("headingDifferenceDeg",
                    round(r.headingDifferenceDeg()));
            o.set("earlier", visit(s, r.earlier()));
            o.set("later", visit(s, r.later()));
        }
        ArrayNode twins = root.putArray("twinDecoys");
        for (TwinDecoy d : s.decoys()) {
            ObjectNode o = twins.addObject();
            o.put("group", d.group()).put("distanceM", round(d.distanceM()));
            o.set("first", visit(s, d.first()));
            o.set("second", visit(s, d.second()));
        }
    }

    private static ObjectNode visit(Scenario s, Visit v) {
        ObjectNode o = JSON.createObjectNode();
        o.put("place", v.place()).put("session", s.sessions().get(v.session()).name()).put("frame", v.frame())
                .put("headingDeg", round(v.headingDeg()));
        return o;
    }

    private static double round(double v) {
        return Math.round(v * 1000) / 1000.0;
    }
}
