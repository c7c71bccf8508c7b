package revisit.consistency;

import java.util.Optional;

/** Motion of the camera along one sequence between two of its frames, with uncertainty. */
interface StretchMotion {

    /** The motion, or the reason there is none. */
    record Stretch(Optional<UncertainPose> motion, UncheckedReason reason) {

        static Stretch of(UncertainPose motion) {
            return new Stretch(Optional.of(motion), UncheckedReason.NO_PARTNER);
        }

        static Stretch missing(UncheckedReason reason) {
            return new Stretch(Optional.empty(), reason);
        }
    }

    /**
     * The pose of {@code to} in the camera frame of {@code from} ({@code fromFromTo}), both on the same sequence.
     *
     * @param from first frame
     * @param to   second frame, same sequence
     */
    Stretch between(FrameRef from, FrameRef to);
}
