package revisit.scenario;

import java.util.Locale;

/** The README.txt written into every scenario folder, for the person who opens it. */
final class ScenarioReadme {

    private ScenarioReadme() {
    }

    static String text(Scenario s) {
        ScenarioConfig c = s.config();
        StringBuilder b = new StringBuilder();
        b.append(s.world().name()).append(" - an invented scenario made by Revisit's generator (version ")
                .append(Scenario.GENERATOR_VERSION).append(", seed ").append(c.seed()).append(")\n\n");
        b.append("Every image here is rendered from a made-up 3D yard: a 30 m x 22 m paved courtyard closed by\n")
                .append("building fronts, with a walking ring around an island of crate stacks, a cross lane between\n")
                .append("four pillars, two kiosks and people and carts walking about. Nothing is taken from a real\n")
                .append("place or a published dataset. Because the world is known exactly, so are the camera poses,\n")
                .append("the depth of every pixel and every place the camera comes back to.\n\n");
        contents(s, b);
        b.append("\nFrames are 8-bit grey PNG, ").append(c.width()).append("x").append(c.height())
                .append(", named frame_00000.png, frame_00001.png, ... in time order;\n")
                .append("frame i is at i / rate seconds, the time of the i-th pose and of the i-th frame-list entry.\n")
                .append("Poses are camera-to-world; world axes x east, y north, z up, metres;\n")
                .append("camera axes x right, y down, z forward.\n\n");
        b.append("Planted revisits: ").append(s.revisits().size()).append(" pairs of visits to the same place (")
                .append(count(s, "same-heading")).append(" same heading, ").append(count(s, "oblique"))
                .append(" oblique, ").append(count(s, "opposite")).append(" opposite direction).\n");
        if (!s.decoys().isEmpty()) {
            b.append("Twin decoys: ").append(s.decoys().size()).append(" pairs of visits to two kiosks that look ")
                    .append("identical\nbut stand ").append(Math.round(s.decoys().get(0).distanceM()))
                    .append(" m apart; a closure between them is false.\n");
        }
        b.append("Nuisances: sensor noise sigma ").append(c.noiseSigma()).append(" grey levels, shutter ")
                .append(c.shutterSeconds()).append(" s (motion blur),\n").append(Math.round(c.defocusFraction() * 100))
                .append("% of frames defocused, exposure drift +-").append(Math.round(c.exposureVariation() * 100))
                .append("%, ").append(c.occluderCount()).append(" walkers.\n");
        photoCredits(s, b);
        b.append("\nThe same settings (\"config\" in manifest.json) and generator version give the same files,\n")
                .append("byte for byte.\n");
        return b.toString();
    }

    private static void contents(Scenario s, StringBuilder b) {
        b.append("Contents\n");
        b.append("  manifest.json       settings, places, planted visits, revisits and twin decoys\n");
        b.append("  ").append(String.format(Locale.ROOT, "%-20s", ScenarioWriter.CAMERA_FILE))
                .append("camera intrinsics and distortion (revisit-camera format)\n");
        for (Session ses : s.sessions()) {
            b.append(String.format(Locale.ROOT, "  %-20s%d frames at %.0f Hz, %s%n", ses.name() + "/"
                    + ScenarioWriter.FRAMES + "/", ses.frameCount(), ses.rateHz(), lightingWords(ses)));
            b.append(String.format(Locale.ROOT, "  %-20sframe list: time stamp and image of every frame%n",
                    ses.name() + "/" + ScenarioWriter.FRAME_LIST));
            b.append(String.format(Locale.ROOT, "  %-20s16-bit PNG z-depth in millimetres (0 = sky)%n",
                    ses.name() + "/" + ScenarioWriter.DEPTH + "/"));
            b.append(String.format(Locale.ROOT, "  %-20sground-truth poses (revisit-trajectory format)%n",
                    ses.name() + "/" + ScenarioWriter.POSES));
        }
    }

    private static void photoCredits(Scenario s, StringBuilder b) {
        if (s.world().photoCredits().isEmpty()) {
            b.append("All textures are procedural (painted by the generator).\n");
            return;
        }
        b.append("\nSome posters on the walls are real photos, used under their licences:\n");
        s.world().photoCredits().forEach(line -> b.append("  ").append(line).append('\n'));
        b.append("CC BY 4.0 photos: attribute the author when you share these frames.\n");
    }

    private static String lightingWords(Session ses) {
        return ses.lighting().gain() < 1 ? "evening light" : "morning light";
    }

    private static long count(Scenario s, String kind) {
        return s.revisits().stream().filter(r -> r.kind().equals(kind)).count();
    }
}
