package revisit.scenario;

/**
 * Derives independent, reproducible seeds and hash values from the scenario seed and integer keys, so that every
 * random choice (a texture, a frame's sensor noise) depends only on the seed and its own key, never on the order
 * in which threads reach it.
 *
 * <p>The mixing step is the SplitMix64 finaliser (Steele, Lea and Flood, "Fast splittable pseudorandom number
 * generators", OOPSLA 2014).
 */
final class SeedMixer {

    private SeedMixer() {
    }

    /** SplitMix64 finaliser: a bijective 64-bit mix. */
    static long mix(long z) {
        z = (z ^ (z >>> 30)) * 0xbf58476d1ce4e5b9L;
        z = (z ^ (z >>> 27)) * 0x94d049bb133111ebL;
        return z ^ (z >>> 31);
    }

    /** Seed for the sub-task named by {@code keys}. */
    static long derive(long seed, long... keys) {
        long h = mix(seed + 0x9e3779b97f4a7c15L);
        for (long k : keys) {
            h = mix(h ^ (k + 0x9e3779b97f4a7c15L + (h << 6) + (h >>> 2)));
        }
        return h;
    }

    /** Uniform value in [0, 1) from a hash of the seed and two lattice coordinates. */
    static double unit(long seed, int i, int j) {
        long h = mix(seed ^ (i * 0x632be59bd9b4e019L) ^ (j * 0x85157af5L + 0x9e3779b97f4a7c15L));
        return (h >>> 11) * 0x1.0p-53;
    }
}
