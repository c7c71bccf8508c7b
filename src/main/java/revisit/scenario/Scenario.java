package revisit.scenario;

import java.util.ArrayList;
import java.util.List;
import revisit.camera.CameraModel;

/**
 * A complete invented scenario: the settings, the camera, the world, the sessions walked through it and the
 * revisits planted by design. Building it paints all textures (about a second); frames are then rendered on
 * demand by {@link FrameMaker}, one per thread.
 *
 * @param config    the settings it was built from
 * @param camera    intrinsics and distortion of every frame
 * @param world     surfaces, walkers and places
 * @param sessions  one or two recordings
 * @param visits    planned passes over the places, in time order per session
 * @param revisits  every pair of visits of one place
 * @param decoys    pairs of visits of twin places (look alike, far apart)
 */
public record Scenario(ScenarioConfig config, CameraModel camera, World world, List<Session> sessions,
                       List<Visit> visits, List<PlantedRevisit> revisits, List<TwinDecoy> decoys) {

    /** Version of the generator, recorded in every manifest; raise it when output for a seed changes. */
    public static final int GENERATOR_VERSION = 1;

    /** Builds the scenario with painted posters only. */
    public static Scenario build(ScenarioConfig config) {
        return build(config, PhotoShelf.empty());
    }

    /**
     * Builds the scenario, pasting real photos as posters when {@code photoFolder} holds any and the config
     * allows it.
     *
     * @param photoFolder folder of photos (searched recursively)
     */
    public static Scenario build(ScenarioConfig config, java.nio.file.Path photoFolder) {
        return build(config, config.photoPosters()
                ? PhotoShelf.load(photoFolder, 8, SeedMixer.derive(config.seed(), 90)) : PhotoShelf.empty());
    }

    static Scenario build(ScenarioConfig config, PhotoShelf photos) {
        List<Session> sessions = YardRoutes.sessions(config, YardWorld.places(config.twinPlace()));
        World world = YardWorld.build(config, photos);
        List<Visit> visits = YardRoutes.visits(sessions, world.places());
        return new Scenario(config, config.camera(), world, List.copyOf(sessions), List.copyOf(visits),
                revisits(visits), decoys(visits, world));
    }

    private static List<PlantedRevisit> revisits(List<Visit> visits) {
        List<PlantedRevisit> out = new ArrayList<>();
        for (int i = 0; i < visits.size(); i++) {
            for (int j = i + 1; j < visits.size(); j++) {
                Visit a = visits.get(i);
                Visit b = visits.get(j);
                if (a.place().equals(b.place())) {
                    double d = PlantedRevisit.headingDifference(a.headingDeg(), b.headingDeg());
                    out.add(new PlantedRevisit(a.place(), a, b, d, PlantedRevisit.kindOf(d)));
                }
            }
        }
        return List.copyOf(out);
    }

    private static List<TwinDecoy> decoys(List<Visit> visits, World world) {
        List<TwinDecoy> out = new ArrayList<>();
        for (int i = 0; i < visits.size(); i++) {
            for (int j = i + 1; j < visits.size(); j++) {
                Place a = world.place(visits.get(i).place());
                Place b = world.place(visits.get(j).place());
                if (!a.twinGroup().isEmpty() && a.twinGroup().equals(b.twinGroup()) && !a.name().equals(b.name())) {
                    out.add(new TwinDecoy(a.twinGroup(), visits.get(i), visits.get(j),
                            Math.hypot(a.x() - b.x(), a.y() - b.y())));
                }
            }
        }
        return List.copyOf(out);
    }

    /** Total number of frames over all sessions. */
    public int totalFrames() {
        return sessions.stream().mapToInt(Session::frameCount).sum();
    }
}
