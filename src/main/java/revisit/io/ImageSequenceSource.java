package revisit.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * Frames from image files known in advance (an image folder or a frame list): the selection is made when the
 * source is built, images are decoded one at a time in {@link #next()}.
 */
final class ImageSequenceSource implements FrameSource {

    /** One image of the whole sequence, before selection. */
    record Item(double timeSeconds, Path image, String name) {
    }

    private record Selected(int index, Item item) {
    }

    private final String description;
    private final List<Selected> selected;
    private int position;

    /**
     * @param kind    what the sequence is, e.g. "image folder /data/run7"
     * @param items   the whole sequence in time order
     * @param options which frames to deliver
     */
    ImageSequenceSource(String kind, List<Item> items, FrameSourceOptions options) {
        FrameSourceOptions.Selector selector = new FrameSourceOptions.Selector(options);
        List<Selected> chosen = new ArrayList<>();
        for (int i = 0; i < items.size() && !selector.done(); i++) {
            if (selector.accept(items.get(i).timeSeconds())) {
                chosen.add(new Selected(i, items.get(i)));
            }
        }
        this.selected = List.copyOf(chosen);
        this.description = kind + ": " + items.size() + " images, " + selected.size() + " selected";
    }

    @Override
    public OptionalInt frameCount() {
        return OptionalInt.of(selected.size());
    }

    @Override
    public String describe() {
        return description;
    }

    @Override
    public Optional<Frame> next() {
        if (position >= selected.size()) {
            return Optional.empty();
        }
        Selected s = selected.get(position++);
        try {
            return Optional.of(new Frame(s.index(), s.item().timeSeconds(), s.item().name(),
                    ImageFiles.readGray(s.item().image())));
        } catch (BadInputException e) {
            throw new BadFrameException(s.index(), s.item().name(), e.getMessage(), e);
        }
    }

    /** Defers the decoding, so that images can be decoded on worker threads; failures surface in decode(). */
    @Override
    public Optional<PendingFrame> nextPending() {
        if (position >= selected.size()) {
            return Optional.empty();
        }
        Selected s = selected.get(position++);
        return Optional.of(new PendingFrame(s.index(), s.item().timeSeconds(), s.item().name(), () -> {
            try {
                return ImageFiles.readGray(s.item().image());
            } catch (BadInputException e) {
                throw new BadFrameException(s.index(), s.item().name(), e.getMessage(), e);
            }
        }));
    }

    @Override
    public void close() {
        position = selected.size();
    }
}
