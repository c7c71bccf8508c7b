package revisit.scenario;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.SplittableRandom;

/**
 * Builds "Tallow Yard", the invented goods yard of the scenario: a 30 m x 22 m paved courtyard closed by 5 m
 * building fronts (about 3 m bays, each painted differently), a walking ring 18 m x 12 m around a central island
 * of crate stacks split by a cross lane with four pillars, two kiosks against the south and north walls, barrels
 * by the walls, and walkers on tracks between the ring and the walls. World axes: x east, y north, z up, metres,
 * floor at z = 0, yard corner at the origin.
 */
final class YardWorld {

    static final double WIDTH = 30;
    static final double DEPTH = 22;
    static final double WALL_HEIGHT = 5;
    /** Centre of the walking ring. */
    static final double RING_X = 15;
    static final double RING_Y = 11;

    private YardWorld() {
    }

    /** The named places (anchors on the lanes). */
    static List<Place> places(boolean twin) {
        String group = twin ? "kiosk" : "";
        return List.of(
                new Place("Lantern Gate", 10, 5, "gate bays of the south wall, where the walk starts", 0, ""),
                new Place("Kiosk South", 19, 5, "tea kiosk against the south wall", 70, group),
                new Place("Pump House", 24, 11, "pump house front on the east wall", 60, ""),
                new Place("Salt Store", 20, 17, "salt store doors on the north wall", 0, ""),
                new Place("Kiosk North", 10, 17, "tea kiosk against the north wall", 70, group),
                new Place("Crate Row", 6, 11, "west side of the crate island", 0, ""),
                new Place("Well Court", 15, 11, "cross lane between the pillars", 0, ""));
    }

    static World build(ScenarioConfig config, PhotoShelf photos) {
        long seed = config.seed();
        List<Surface> s = new ArrayList<>();
        s.add(Surface.horizontal(0, 0, WIDTH, DEPTH, 0,
                TextureDesigns.floor(SeedMixer.derive(seed, 1), WIDTH, DEPTH, 40), 1.0, ""));
        walls(s, seed, photos);
        kiosks(s, seed, config.twinPlace());
        crates(s, seed, 9.2);
        crates(s, seed, 18.0);
        for (double[] p : new double[][]{{13.6, 9.5}, {16.4, 9.5}, {13.6, 12.5}, {16.4, 12.5}}) {
            s.addAll(Surface.box(new Vec3(p[0], p[1], 0), 0.4, 0.4, 4, 0,
                    sides(k -> TextureDesigns.pillar(SeedMixer.derive(seed, 40, (long) (p[0] * 10 + p[1]), k),
                            0.4, 4)), 0.9, "Well Court"));
        }
        for (double[] b : new double[][]{{1.5, 1.5}, {28.5, 1.5}, {1.5, 20.5}, {28.5, 20.5}, {8, 0.8},
                {25, 21.2}, {29.2, 15}, {0.8, 7}}) {
            long k0 = SeedMixer.derive(seed, 50, (long) (b[0] * 10), (long) (b[1] * 10));
            s.addAll(Surface.box(new Vec3(b[0], b[1], 0), 0.6, 0.6, 0.9, 0.3,
                    sides(k -> TextureDesigns.plain(SeedMixer.derive(k0, k), 0.6, 0.9, 0.3f + 0.1f * k)),
                    1.0, ""));
        }
        return new World("Tallow Yard", s, walkers(config), places(config.twinPlace()), photos.credits());
    }

    private static void walls(List<Surface> out, long seed, PhotoShelf photos) {
        double[][] walls = {{0, 0, 1, 0, WIDTH}, {WIDTH, DEPTH, -1, 0, WIDTH}, {0, DEPTH, 0, -1, DEPTH},
                {WIDTH, 0, 0, 1, DEPTH}};
        int bay = 0;
        for (double[] w : walls) {
            int bays = (int) Math.round(w[4] / 3.0);
            double bayWidth = w[4] / bays;
            Vec3 along = new Vec3(w[2], w[3], 0);
            Vec3 inward = Vec3.UP.cross(along);
            for (int i = 0; i < bays; i++, bay++) {
                Vec3 centre = new Vec3(w[0], w[1], 0).plus(along.times((i + 0.5) * bayWidth));
                Optional<Texture> photo = bay % 3 == 1 && !photos.photos().isEmpty()
                        ? Optional.of(photos.photos().get((bay / 3) % photos.photos().size())) : Optional.empty();
                Texture t = TextureDesigns.facadeBay(SeedMixer.derive(seed, 100, bay), bayWidth, WALL_HEIGHT, photo);
                out.add(Surface.upright(centre, inward, bayWidth, WALL_HEIGHT, t, 1.0, ""));
            }
        }
    }

    private static void kiosks(List<Surface> out, long seed, boolean twin) {
        long south = SeedMixer.derive(seed, 30, 1);
        long north = twin ? south : SeedMixer.derive(seed, 30, 2);
        kiosk(out, new Vec3(19, 1.95, 0), 0, south, "Kiosk South");
        kiosk(out, new Vec3(10, DEPTH - 1.95, 0), Math.PI, north, "Kiosk North");
    }

    private static void kiosk(List<Surface> out, Vec3 centre, double yaw, long design, String place) {
        Texture front = TextureDesigns.kioskFront(design, 2.5, 2.6);
        Texture side = TextureDesigns.facadeBay(SeedMixer.derive(design, 1), 1.5, 2.6, Optional.empty());
        Texture back = TextureDesigns.plain(SeedMixer.derive(design, 2), 2.5, 2.6, 0.5f);
        Texture roof = TextureDesigns.plain(SeedMixer.derive(design, 3), 2.5, 1.5, 0.3f);
        out.addAll(Surface.box(centre, 2.5, 1.5, 2.6, yaw, List.of(side, front, side, back, roof), 1.0, place));
    }

    /** A block of crate stacks: 3 x 4 cells of 1.4 m, each with 0, 1 or 2 crates of 1.2 m. */
    private static void crates(List<Surface> out, long seed, double x0) {
        SplittableRandom rnd = new SplittableRandom(SeedMixer.derive(seed, 20, (long) x0));
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 4; j++) {
                int height = rnd.nextInt(10) < 3 ? 0 : 1 + rnd.nextInt(2);
                double yaw = Math.toRadians(rnd.nextDouble() * 10 - 5);
                for (int level = 0; level < height; level++) {
                    long style = SeedMixer.derive(seed, 21, rnd.nextInt(3));
                    long marks = rnd.nextLong();
                    Vec3 c = new Vec3(x0 + 1.4 * i, 8.4 + 1.4 * j, 1.2 * level);
                    out.addAll(Surface.box(c, 1.2, 1.2, 1.2, yaw,
                            sides(k -> TextureDesigns.crate(style, SeedMixer.derive(marks, k), 1.2)),
                            0.95, "Crate Row"));
                }
            }
        }
    }

    private interface SideDesign {
        Texture paint(int side);
    }

    private static List<Texture> sides(SideDesign design) {
        List<Texture> t = new ArrayList<>(5);
        for (int k = 0; k < 5; k++) {
            t.add(design.paint(k));
        }
        return t;
    }

    private static List<Walker> walkers(ScenarioConfig config) {
        double[][] tracks = {{2, 3.4, 28, 3.4}, {2, 18.6, 28, 18.6}, {27.2, 3, 27.2, 19}, {2.8, 3, 2.8, 19}};
        SplittableRandom rnd = new SplittableRandom(SeedMixer.derive(config.seed(), 60));
        List<Walker> out = new ArrayList<>();
        for (int i = 0; i < config.occluderCount(); i++) {
            double[] t = tracks[i % tracks.length];
            boolean person = i % 2 == 0;
            double w = person ? 0.5 : 0.7;
            double l = person ? 0.3 : 1.0;
            double h = person ? 1.7 : 1.0;
            long k0 = SeedMixer.derive(config.seed(), 61, i);
            List<Texture> sides = sides(k -> person ? TextureDesigns.walker(SeedMixer.derive(k0, k), k % 2 == 0
                    ? l : w, h) : TextureDesigns.plain(SeedMixer.derive(k0, k), 1.0, 1.0, 0.6f));
            out.add(new Walker(person ? "person" : "cart", new Vec3(t[0], t[1], 0), new Vec3(t[2], t[3], 0),
                    0.8 + rnd.nextDouble() * 0.6, rnd.nextDouble(), w, l, h, sides));
        }
        return out;
    }
}
