package org.gyreplan.app.pipeline;

import java.nio.file.Path;

/** An input that cannot be used; the message names the file, the item and what was expected. */
public final class StudyException extends Exception {
    private final Path file;
    private final String item;

    public StudyException(Path file, String item, String message) {
        super((file == null ? "" : file + ": ") + (item == null || item.isEmpty() ? "" : item + ": ") + message);
        this.file = file;
        this.item = item;
    }

    public StudyException(Path file, String item, String message, Throwable cause) {
        this(file, item, message);
        initCause(cause);
    }

    public Path file() { return file; }
    public String item() { return item; }
}
