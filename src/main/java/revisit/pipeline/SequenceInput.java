package revisit.pipeline;

import java.nio.file.Path;

/**
 * One sequence to scan.
 *
 * @param path an image folder, a frame-list file or a video file
 * @param name a short name for reports (defaults to the file name)
 */
public record SequenceInput(Path path, String name) {

    /**
     * Sequences named after their files or folders; where two would share a name, the parent folder is put in
     * front ({@code session1-frames}), and failing that the position ({@code frames-2}).
     */
    public static java.util.List<SequenceInput> ofAll(java.util.List<Path> paths) {
        java.util.List<SequenceInput> plain = paths.stream().map(SequenceInput::of).toList();
        java.util.List<SequenceInput> out = new java.util.ArrayList<>();
        java.util.Set<String> used = new java.util.HashSet<>();
        for (int i = 0; i < plain.size(); i++) {
            SequenceInput s = plain.get(i);
            String name = s.name();
            long same = plain.stream().filter(o -> o.name().equals(s.name())).count();
            Path abs = s.path().toAbsolutePath().normalize();
            if (same > 1 && abs.getParent() != null && abs.getParent().getFileName() != null) {
                name = abs.getParent().getFileName() + "-" + name;
            }
            if (!used.add(name)) {
                name = name + "-" + (i + 1);
                used.add(name);
            }
            out.add(new SequenceInput(s.path(), name));
        }
        return out;
    }

    /** A sequence named after its file or folder. */
    public static SequenceInput of(Path path) {
        Path fn = path.toAbsolutePath().normalize().getFileName();
        return new SequenceInput(path, fn == null ? path.toString() : fn.toString());
    }
}
