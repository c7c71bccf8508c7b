package revisit.consistency;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import georegression.struct.se.Se3_F64;
import java.util.List;
import org.junit.jupiter.api.Test;
import revisit.io.StampedPose;
import revisit.verification.RotationVector;

class OdometryTrackTest {

    private static final double S = Math.sqrt(0.5);

    /** Identity at t=0 at the origin; at t=2, at (4, 0, 0) turned 90 degrees about z. */
    private static OdometryTrack quarterTurn() {
        return new OdometryTrack(List.of(new StampedPose(0, 0, 0, 0, 0, 0, 0, 1),
                new StampedPose(2, 4, 0, 0, 0, 0, S, S)));
    }

    @Test
    void interpolatesPositionLinearlyAndRotationAlongTheShorterArc() {
        // Hand-checkable: half way is (2, 0, 0) turned 45 degrees about z.
        Se3_F64 mid = quarterTurn().poseAt(1.0).orElseThrow();
        assertEquals(2.0, mid.T.x, 1e-12);
        assertEquals(0.0, mid.T.y, 1e-12);
        assertEquals(Math.PI / 4, RotationVector.angle(mid.R), 1e-12);
        assertEquals(Math.cos(Math.PI / 4), mid.R.get(0, 0), 1e-12);
        assertEquals(Math.sin(Math.PI / 4), mid.R.get(1, 0), 1e-12);
        Se3_F64 quarter = quarterTurn().poseAt(0.5).orElseThrow();
        assertEquals(Math.PI / 8, RotationVector.angle(quarter.R), 1e-12);
    }

    @Test
    void reproducesTheSamplesAtTheirTimes() {
        Se3_F64 end = quarterTurn().poseAt(2.0).orElseThrow();
        assertEquals(4.0, end.T.x, 1e-12);
        assertEquals(Math.PI / 2, RotationVector.angle(end.R), 1e-12);
    }

    @Test
    void takesTheShorterArcWhenQuaternionSignsDiffer() {
        // q and -q are the same rotation; interpolation must not swing the long way round.
        OdometryTrack track = new OdometryTrack(List.of(new StampedPose(0, 0, 0, 0, 0, 0, 0, 1),
                new StampedPose(1, 0, 0, 0, 0, 0, -Math.sin(0.1), -Math.cos(0.1))));
        assertEquals(0.1, RotationVector.angle(track.poseAt(0.5).orElseThrow().R), 1e-12);
    }

    @Test
    void refusesTimesOutsideTheSamples() {
        assertTrue(quarterTurn().poseAt(-0.01).isEmpty());
        assertTrue(quarterTurn().poseAt(2.01).isEmpty());
    }

    @Test
    void measuresDistanceTravelledAndAngleTurnedBetweenTimes() {
        OdometryTrack track = quarterTurn();
        assertEquals(2.0, track.distanceBetween(0.5, 1.5), 1e-12);
        assertEquals(Math.PI / 4, track.turnBetween(1.5, 0.5), 1e-12);
    }

    @Test
    void refusesTimesThatDoNotIncrease() {
        assertThrows(IllegalArgumentException.class, () -> new OdometryTrack(List.of(
                new StampedPose(1, 0, 0, 0, 0, 0, 0, 1), new StampedPose(1, 1, 0, 0, 0, 0, 0, 1))));
    }
}
