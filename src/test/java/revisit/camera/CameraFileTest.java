package revisit.camera;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import revisit.io.BadInputException;

class CameraFileTest {

    @TempDir
    Path dir;

    @Test
    void roundTripKeepsEveryParameter() {
        CameraModel c = new CameraModel(800, 600, 610.5, 611.25, 0.5, 399.5, 301.0, -0.1, 0.02, 0.001, 1e-4, -2e-4);
        Path f = dir.resolve("cam.json");
        CameraFile.write(f, c);
        assertEquals(c, CameraFile.read(f));
    }

    @Test
    void distortionFieldsDefaultToZero() throws Exception {
        Path f = dir.resolve("cam.json");
        Files.writeString(f, "{\"format\":\"revisit-camera\",\"version\":1,\"width\":640,\"height\":480,"
                + "\"fx\":500,\"fy\":500,\"cx\":320,\"cy\":240}");
        assertTrue(CameraFile.read(f).isDistortionFree());
    }

    @Test
    void malformedFilesGiveOneLineNamingTheFile() throws Exception {
        String[] bad = {
            "{\"format\":\"revisit-camera\",\"version\":1,\"width\":640,\"height\":480,\"fx\":500,\"fy\":500,\"cx\":320}",
            "{\"format\":\"other\",\"version\":1}",
            "{\"format\":\"revisit-camera\",\"version\":9,\"width\":640,\"height\":480,\"fx\":1,\"fy\":1,\"cx\":1,\"cy\":1}",
            "{\"format\":\"revisit-camera\",\"version\":1,\"width\":640,\"height\":480,\"fx\":-5,\"fy\":500,\"cx\":320,\"cy\":240}",
            "{\"format\":\"revisit-camera\",\"version\":1,\"width\":640,\"height\":480,\"fx\":500,\"fy\":500,\"cx\":320,\"cy\":240,\"k9\":1}",
            "{\"format\":\"revisit-camera\",\"version\":1,\"width\":\"a\"",
            "[1,2]"
        };
        for (int i = 0; i < bad.length; i++) {
            Path f = dir.resolve("bad" + i + ".json");
            Files.writeString(f, bad[i]);
            BadInputException e = assertThrows(BadInputException.class, () -> CameraFile.read(f), bad[i]);
            assertTrue(e.getMessage().startsWith(f.toString()), e.getMessage());
            assertTrue(!e.getMessage().contains("\n"), e.getMessage());
        }
    }

    @Test
    void missingFileIsReportedClearly() {
        Path f = dir.resolve("none.json");
        BadInputException e = assertThrows(BadInputException.class, () -> CameraFile.read(f));
        assertTrue(e.getMessage().contains("not found"), e.getMessage());
    }
}
