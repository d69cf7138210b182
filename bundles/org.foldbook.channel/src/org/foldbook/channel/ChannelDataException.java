package org.foldbook.channel;

import java.io.IOException;
import java.nio.file.Path;

/** A channel's recording cannot be used: the message names the file and says what is wrong. */
public final class ChannelDataException extends IOException {
    private static final long serialVersionUID = 1L;

    private final Path file;

    public ChannelDataException(Path file, String problem) {
        super((file == null ? "(no file)" : file.toString()) + ": " + problem);
        this.file = file;
    }

    public ChannelDataException(Path file, String problem, Throwable cause) {
        super((file == null ? "(no file)" : file.toString()) + ": " + problem, cause);
        this.file = file;
    }

    /** The recording file concerned, or null when the channel names none. */
    public Path file() {
        return file;
    }
}
