package revisit.scenario;

/**
 * Two visits of one place: a revisit the route was designed to make.
 *
 * @param place                place name
 * @param earlier              first visit (earlier session, or earlier frame in the same session)
 * @param later                second visit
 * @param headingDifferenceDeg planned heading difference, degrees in [0, 180]
 * @param kind                 "same-heading" (under 25 degrees), "oblique" (25 to 100), "wide" (100 to 150) or
 *                             "opposite" (150 and more)
 */
public record PlantedRevisit(String place, Visit earlier, Visit later, double headingDifferenceDeg, String kind) {

    /** Kind of a revisit from its heading difference, degrees. */
    public static String kindOf(double headingDifferenceDeg) {
        if (headingDifferenceDeg < 25) {
            return "same-heading";
        }
        if (headingDifferenceDeg < 100) {
            return "oblique";
        }
        return headingDifferenceDeg < 150 ? "wide" : "opposite";
    }

    /** Smallest angle between two headings, degrees in [0, 180]. */
    public static double headingDifference(double aDeg, double bDeg) {
        double d = Math.abs(aDeg - bDeg) % 360;
        return d > 180 ? 360 - d : d;
    }
}
