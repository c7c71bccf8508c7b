package revisit.evaluation;

import revisit.SharedData;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import georegression.struct.point.Point3D_F64;
import georegression.struct.se.Se3_F64;
import georegression.transform.se.SePointOps_F64;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import revisit.io.BadInputException;

class KrtCameraFileTest {

    @TempDir
    Path dir;

    /** Identity K-less camera at world (0, 0, -2) looking along +z: R = I, t = (0, 0, 2). */
    private static final String VIEW = "a.png 500 0 320 0 500 240 0 0 1 1 0 0 0 1 0 0 0 1 0 0 2";

    @Test
    void convertsWorldToCameraIntoCameraToWorldPose() throws IOException {
        // A 90-degree turn about y: R rows (0 0 -1; 0 1 0; 1 0 0), t = (1, 2, 3). Centre C = -R^T t = (-3, -2, 1).
        Path file = dir.resolve("par.txt");
        Files.writeString(file, "2\n" + VIEW + "\nb.png 400 1 300 0 410 200 0 0 1 0 0 -1 0 1 0 1 0 0 1 2 3\n");
        List<KrtView> views = KrtCameraFile.read(file);
        assertEquals(2, views.size());
        assertEquals(-2, views.get(0).pose().z(), 1e-12);
        KrtView b = views.get(1);
        assertEquals(-3, b.pose().x(), 1e-12);
        assertEquals(-2, b.pose().y(), 1e-12);
        assertEquals(1, b.pose().z(), 1e-12);
        assertEquals(1.0, b.pose().timeSeconds());
        // Round trip: a world point moved into the camera by [R|t] and back by the pose returns unchanged.
        Point3D_F64 world = new Point3D_F64(0.3, -0.7, 2.5);
        Point3D_F64 cam = new Point3D_F64(-world.z + 1, world.y + 2, world.x + 3);
        Se3_F64 camToWorld = b.pose().cameraToWorld();
        Point3D_F64 back = SePointOps_F64.transform(camToWorld, cam, null);
        assertEquals(0, back.distance(world), 1e-12);
        assertEquals(410, b.cameraModel(640, 480).fy());
        assertEquals(1, b.cameraModel(640, 480).skew());
    }

    @Test
    void readsTheMiddleburyDinoRingCameras() {
        // Middlebury dinoRing (Seitz et al., CVPR 2006): dino_par.txt lists 363 views; view 1's centre
        // C = -R^T t computed by hand from its line is about (0.1396, 0.0067, -0.6461), 0.661 from the origin.
        Path par = SharedData.require("middlebury/dinoRing/dino_par.txt");
        List<KrtView> views = KrtCameraFile.read(par);
        assertEquals(363, views.size());
        assertEquals("dino0001.png", views.get(0).imageName());
        assertEquals(0.1396, views.get(0).pose().x(), 1e-4);
        assertEquals(0.0067, views.get(0).pose().y(), 1e-4);
        assertEquals(-0.6461, views.get(0).pose().z(), 1e-4);
        assertEquals(3310.4, views.get(0).k()[0], 1e-9);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "no count|a.png 1 2 3|1|expected the number of views",
        "short line|1\\na.png 500 0 320|2|expected 22 fields",
        "not a number|1\\na.png 500 0 320 0 500 240 0 0 1 1 0 0 0 1 0 0 0 1 0 0 two|2|'two' is not a number",
        "not a rotation|1\\na.png 500 0 320 0 500 240 0 0 1 1 0 0 0 2 0 0 0 1 0 0 2|2|R is not a rotation",
        "mirror|1\\na.png 500 0 320 0 500 240 0 0 1 -1 0 0 0 1 0 0 0 1 0 0 2|2|R is not a rotation",
        "bad K|1\\na.png 500 0 320 0 500 240 0 0 2 1 0 0 0 1 0 0 0 1 0 0 2|2|K is not an upper-triangular"})
    void refusesMalformedLinesNamingFileAndLine(String name, String text, int line, String what) throws IOException {
        Path file = dir.resolve("par.txt");
        Files.writeString(file, text.replace("\\n", "\n"));
        BadInputException e = assertThrows(BadInputException.class, () -> KrtCameraFile.read(file));
        assertTrue(e.getMessage().startsWith(file + ":" + line + ": "), e.getMessage());
        assertTrue(e.getMessage().contains(what), e.getMessage());
    }

    @Test
    void refusesAViewCountThatDoesNotMatchTheLines() throws IOException {
        Path file = dir.resolve("par.txt");
        Files.writeString(file, "3\n" + VIEW + "\n" + VIEW + "\n");
        BadInputException e = assertThrows(BadInputException.class, () -> KrtCameraFile.read(file));
        assertTrue(e.getMessage().contains("declares 3 views but 2"), e.getMessage());
    }
}
