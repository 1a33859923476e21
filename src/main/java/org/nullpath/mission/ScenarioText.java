package org.nullpath.mission;

import java.nio.file.Path;
import java.util.Objects;

/**
 * The scenario as it was loaded: where it came from and its text, for the report's echo.
 *
 * @param file where it was read from (or the name it was given)
 * @param text the text read, byte order mark removed
 */
public record ScenarioText(Path file, String text) {
    public ScenarioText {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(text, "text");
    }

    /** The file's own name, without folders. */
    public String fileName() {
        Path f = file.getFileName();
        return f == null ? file.toString() : f.toString();
    }
}
