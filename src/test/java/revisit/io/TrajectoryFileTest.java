package revisit.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import georegression.struct.se.Se3_F64;
import georegression.struct.se.SpecialEuclideanOps_F64;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class TrajectoryFileTest {

    @TempDir
    Path dir;

    @Test
    void roundTripPreservesPosesToPrintedPrecision() {
        List<StampedPose> poses = new ArrayList<>();
        for (int i = 0; i < 20; i++) {
            Se3_F64 se = SpecialEuclideanOps_F64.eulerXyz(i * 0.3, -i * 0.1, 2.0, 0.1 * i, -0.2 * i, 0.05 * i, null);
            poses.add(StampedPose.of(i * 0.1, se));
        }
        Path f = dir.resolve("t.txt");
        TrajectoryFile.write(f, poses);
        List<StampedPose> back = TrajectoryFile.read(f);
        assertEquals(poses.size(), back.size());
        for (int i = 0; i < poses.size(); i++) {
            assertEquals(0, poses.get(i).distanceTo(back.get(i)), 1e-6);
            assertEquals(0, poses.get(i).angleTo(back.get(i)), 1e-6);
            assertEquals(poses.get(i).timeSeconds(), back.get(i).timeSeconds(), 1e-6);
        }
    }

    @Test
    void quarterTurnAboutZHasTheExpectedAngle() {
        // Known answer: q = (0, 0, sin 45deg, cos 45deg) is a 90 degree turn about z.
        double s = Math.sqrt(0.5);
        StampedPose a = new StampedPose(0, 0, 0, 0, 0, 0, 0, 1);
        StampedPose b = new StampedPose(1, 3, 4, 0, 0, 0, s, s);
        assertEquals(Math.PI / 2, a.angleTo(b), 1e-12);
        assertEquals(5, a.distanceTo(b), 1e-12);
        Se3_F64 se = b.cameraToWorld();
        assertEquals(-1, se.R.get(0, 1), 1e-12);
    }

    @Test
    void malformedLinesNameFileAndLine() throws Exception {
        String head = TrajectoryFile.HEADER + "\n";
        String[][] cases = {
            {head + "0 0 0 0 0 0 0 1\n1 2 3\n", ":3:"},
            {head + "0 0 0 0 0 0 0 1\n1 0 0 x 0 0 0 1\n", ":3:"},
            {head + "0 0 0 0 0 0 0 1\n0 0 0 0 0 0 0 1\n", ":3:"},
            {head + "0 0 0 0 0 0 0 2\n", ":2:"},
            {"0 0 0 0 0 0 0 1\n", ":1:"},
            {head, "no poses"},
        };
        for (String[] c : cases) {
            Path f = dir.resolve("bad.txt");
            Files.writeString(f, c[0]);
            BadInputException e = assertThrows(BadInputException.class, () -> TrajectoryFile.read(f));
            assertTrue(e.getMessage().contains(c[1]), e.getMessage());
            assertTrue(e.getMessage().startsWith(f.toString()), e.getMessage());
        }
    }
}
