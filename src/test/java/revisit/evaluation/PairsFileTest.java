package revisit.evaluation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import revisit.io.BadInputException;

class PairsFileTest {

    @TempDir
    Path dir;

    private static final FrameTimeline ONE = FrameTimeline.of(SequenceFrames.uniform("cam", 100, 10));
    private static final FrameTimeline TWO = new FrameTimeline(List.of(SequenceFrames.uniform("hall", 50, 10),
            SequenceFrames.uniform("yard", 50, 10)));

    private Path write(String text) throws IOException {
        Path file = dir.resolve("pairs.txt");
        Files.writeString(file, text);
        return file;
    }

    private static FrameKey cam(int frame) {
        return new FrameKey("cam", frame);
    }

    @Test
    void readsFramePairsAndIntervalsWithTheLaterFrameAsQuery() throws IOException {
        Path file = write("# revisit-pairs 1 frames\n# comment\n\n80 10   # trailing comment\n5 90\n60-61 20-22\n");
        RevisitLabels labels = PairsFile.read(file, ONE, ExclusionWindow.none());
        assertEquals(List.of(cam(10)), labels.matchesOf(cam(80)));
        assertEquals(List.of(cam(5)), labels.matchesOf(cam(90)));
        assertEquals(List.of(cam(20), cam(21), cam(22)), labels.matchesOf(cam(60)));
        assertEquals(List.of(cam(20), cam(21), cam(22)), labels.matchesOf(cam(61)));
        assertEquals(4, labels.positiveCount());
        assertEquals(8, labels.pairCount());
        assertFalse(labels.isPositive(cam(10)));
    }

    @Test
    void headerWithoutUnitMeansFrames() throws IOException {
        RevisitLabels labels = PairsFile.read(write("# revisit-pairs 1\n40 2\n"), ONE, ExclusionWindow.none());
        assertEquals(List.of(cam(2)), labels.matchesOf(cam(40)));
    }

    @Test
    void readsSequenceIdsAcrossSessions() throws IOException {
        Path file = write("# revisit-pairs 1 frames\nyard:3 hall:40\nyard:10-11 yard:0\n");
        RevisitLabels labels = PairsFile.read(file, TWO, ExclusionWindow.none());
        assertEquals(List.of(new FrameKey("hall", 40)), labels.matchesOf(new FrameKey("yard", 3)));
        assertEquals(List.of(new FrameKey("yard", 0)), labels.matchesOf(new FrameKey("yard", 11)));
    }

    @Test
    void snapsTimesToTheNearestFrame() throws IOException {
        // 10 frames per second: 8.04 s -> frame 80, 1.0 s -> frame 10, 6.0-6.1 s -> frames 60-61.
        Path file = write("# revisit-pairs 1 seconds\n8.04 1.0\n6.0-6.1 .2\n");
        RevisitLabels labels = PairsFile.read(file, ONE, ExclusionWindow.none());
        assertEquals(List.of(cam(10)), labels.matchesOf(cam(80)));
        assertEquals(List.of(cam(2)), labels.matchesOf(cam(60)));
        assertEquals(List.of(cam(2)), labels.matchesOf(cam(61)));
    }

    @Test
    void dropsAndCountsPairsInsideTheExclusionWindow() throws IOException {
        // Window 10 frames: 50-40 (gap 10) is dropped, 50-39 (gap 11) kept. Window 2 s at 10 fps = 20 frames
        // drops 50-39 too (gap 1.1 s) but keeps 50-29 (gap 2.1 s).
        Path file = write("# revisit-pairs 1\n50 40\n50 39\n50 29\n");
        RevisitLabels byFrames = PairsFile.read(file, ONE, new ExclusionWindow(0, 10));
        assertEquals(List.of(cam(29), cam(39)), byFrames.matchesOf(cam(50)));
        assertEquals(1, byFrames.droppedPairs());
        RevisitLabels bySeconds = PairsFile.read(file, ONE, new ExclusionWindow(2.0, 0));
        assertEquals(List.of(cam(29)), bySeconds.matchesOf(cam(50)));
        assertEquals(2, bySeconds.droppedPairs());
    }

    @Test
    void writtenLabelsReadBackUnchanged() throws IOException {
        Path file = write("# revisit-pairs 1 frames\nyard:3 hall:40\nyard:10-12 hall:0-1\n");
        RevisitLabels labels = PairsFile.read(file, TWO, ExclusionWindow.none());
        Path copy = dir.resolve("copy.txt");
        PairsFile.write(copy, labels);
        RevisitLabels again = PairsFile.read(copy, TWO, ExclusionWindow.none());
        assertEquals(labels.pairCount(), again.pairCount());
        for (int f = 0; f < 50; f++) {
            FrameKey q = new FrameKey("yard", f);
            assertEquals(labels.matchesOf(q), again.matchesOf(q));
        }
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "wrong header|# some-other-file 1\\n1 0|1|not a revisit pairs file",
        "unknown unit|# revisit-pairs 1 minutes\\n1 0|1|unknown unit 'minutes'",
        "three fields|# revisit-pairs 1\\n80 10 5|2|expected 2 fields",
        "one field|# revisit-pairs 1\\n\\n80|3|expected 2 fields",
        "not a number|# revisit-pairs 1\\n80 ten|2|'ten' is not a frame number",
        "decimal frame|# revisit-pairs 1 frames\\n80.5 10|2|for times write 'seconds' in the header",
        "negative frame|# revisit-pairs 1\\n80 -3|2|cannot read '-3'",
        "backwards interval|# revisit-pairs 1\\n80-70 10|2|runs backwards",
        "past the end|# revisit-pairs 1\\n100 10|2|frame 100 is past the end of sequence 'cam'",
        "same frame|# revisit-pairs 1\\n40 40|2|a frame cannot revisit itself",
        "sequence unknown|# revisit-pairs 1\\nlobby:3 cam:1|2|unknown sequence 'lobby'",
        "bad time|# revisit-pairs 1 seconds\\n8.0 1.0x|2|'1.0x' is not a time in seconds",
        "time off the clock|# revisit-pairs 1 seconds\\n8.0 20.0|2|from the nearest frame",
        "too many pairs|# revisit-pairs 1\\n50-99 0-40|2|expands to 2050 pairs"})
    void refusesMalformedLinesNamingFileAndLine(String name, String text, int line, String what) throws IOException {
        Path file = write(text.replace("\\n", "\n"));
        BadInputException e = assertThrows(BadInputException.class,
                () -> PairsFile.read(file, ONE, ExclusionWindow.none(), 1000));
        assertTrue(e.getMessage().startsWith(file + ":" + line + ": "), e.getMessage());
        assertTrue(e.getMessage().contains(what), e.getMessage());
    }

    @Test
    void requiresSequenceIdsWhenTheScanHoldsSeveralSequences() throws IOException {
        Path file = write("# revisit-pairs 1\nyard:3 hall:4\n30 1\n");
        BadInputException e = assertThrows(BadInputException.class,
                () -> PairsFile.read(file, TWO, ExclusionWindow.none()));
        assertTrue(e.getMessage().startsWith(file + ":3: the scan holds several sequences"), e.getMessage());
    }

    @Test
    void refusesAnEmptyOrMissingFile() throws IOException {
        Path empty = write("");
        assertTrue(assertThrows(BadInputException.class, () -> PairsFile.read(empty, ONE, ExclusionWindow.none()))
                .getMessage().startsWith(empty + ":1: not a revisit pairs file"));
        Path missing = dir.resolve("absent.txt");
        assertTrue(assertThrows(BadInputException.class, () -> PairsFile.read(missing, ONE, ExclusionWindow.none()))
                .getMessage().contains("pairs file not found"));
    }
}
