package revisit.scenario;

import java.util.ArrayList;
import java.util.List;

/**
 * Everything the camera can see: fixed surfaces, walkers that move with time, and the named places.
 *
 * @param name         display name of the invented place
 * @param fixed        static surfaces
 * @param walkers      moving occluders
 * @param places       named places with lane anchors
 * @param photoCredits one line per real photo pasted into a texture (file, licence, author), empty if none
 */
public record World(String name, List<Surface> fixed, List<Walker> walkers, List<Place> places,
                    List<String> photoCredits) {

    public World {
        fixed = List.copyOf(fixed);
        walkers = List.copyOf(walkers);
        places = List.copyOf(places);
        photoCredits = List.copyOf(photoCredits);
    }

    /** All surfaces at time t: the fixed ones first (in order), then each walker's box. */
    public List<Surface> surfacesAt(double t) {
        List<Surface> all = new ArrayList<>(fixed.size() + 5 * walkers.size());
        all.addAll(fixed);
        for (Walker w : walkers) {
            all.addAll(w.surfacesAt(t));
        }
        return all;
    }

    /** The place with this name. */
    public Place place(String placeName) {
        return places.stream().filter(p -> p.name().equals(placeName)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no place named " + placeName));
    }
}
