package revisit.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ConfigFileTest {

    @TempDir
    Path dir;

    private Path file(String body) throws IOException {
        Path f = dir.resolve("config.json");
        Files.writeString(f, "{\"format\": \"revisit-config\", \"version\": 1, " + body + "}");
        return f;
    }

    @Test
    void formerScanInlierRatioBecomesTheVerificationBar() throws IOException {
        ScanConfig c = ConfigFile.read(file("\"scan\": {\"minInlierRatio\": 0.22, \"threads\": 1}"));
        assertEquals(0.22, c.verification().minInlierRatio());
        assertEquals(1, c.scan().threads());
    }

    @Test
    void fileWithBothRatiosKeepsTheStricterOneThatDecidedBefore() throws IOException {
        ScanConfig both = ConfigFile.read(file("\"verification\": {\"minInlierRatio\": 0.1},"
                + " \"scan\": {\"minInlierRatio\": 0.3}"));
        assertEquals(0.3, both.verification().minInlierRatio());
        ScanConfig verificationStricter = ConfigFile.read(file("\"verification\": {\"minInlierRatio\": 0.4},"
                + " \"scan\": {\"minInlierRatio\": 0.3}"));
        assertEquals(0.4, verificationStricter.verification().minInlierRatio());
    }

    @Test
    void writtenFileHasOneRatioAndReadsBackUnchanged() throws IOException {
        Path f = dir.resolve("all.json");
        ScanConfig tuned = ScanConfig.defaults().withVerification(
                ScanConfig.defaults().verification().withMinInlierRatio(0.35));
        ConfigFile.write(f, tuned, "");
        assertEquals(tuned, ConfigFile.read(f));
        assertEquals(1, Files.readString(f).split("minInlierRatio", -1).length - 1);
    }

    @Test
    void formerScanRatioOverrideSetsTheVerificationBar() {
        ScanConfig c = ConfigFile.override(ScanConfig.defaults(), List.of("scan.minInlierRatio=0.45"));
        assertEquals(0.45, c.verification().minInlierRatio());
        ScanConfig d = ConfigFile.override(ScanConfig.defaults(), List.of("verification.minInlierRatio=0.15"));
        assertEquals(0.15, d.verification().minInlierRatio());
    }
}
