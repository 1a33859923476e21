package org.nullpath.mission;

import java.nio.file.Path;
import java.util.Collections;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * The scenario as it was loaded: where it came from, its text, and the values replaced in it for this run
 * (a study resolves one scenario many times with one value changed), for the report's echo.
 *
 * @param file     where it was read from (or the name it was given)
 * @param text     the text read, byte order mark removed
 * @param replaced key path to the value that replaced the one written there, in the order first replaced
 * @param alsoRead the other files the scenario made the loader read (profile tables), in the order read
 */
public record ScenarioText(Path file, String text, Map<String, String> replaced, List<Path> alsoRead) {
    public ScenarioText {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(text, "text");
        replaced = Collections.unmodifiableMap(new LinkedHashMap<>(replaced));
        alsoRead = List.copyOf(alsoRead);
    }

    /** The text as read, with values replaced, no other file read. */
    public ScenarioText(Path file, String text, Map<String, String> replaced) {
        this(file, text, replaced, List.of());
    }

    /** The text as read, nothing replaced. */
    public ScenarioText(Path file, String text) {
        this(file, text, Map.of());
    }

    /** The same text with one more value replaced. */
    public ScenarioText replacing(String keyPath, String value) {
        Map<String, String> r = new LinkedHashMap<>(replaced);
        r.put(keyPath, value); // a key replaced again keeps its place
        return new ScenarioText(file, text, r, alsoRead);
    }

    /** The same text, having made the loader read {@code files} too. */
    public ScenarioText reading(List<Path> files) {
        List<Path> all = new ArrayList<>(alsoRead);
        all.addAll(files);
        return new ScenarioText(file, text, replaced, all);
    }

    /** Every file this plan reads: the scenario, then the files it made the loader read. */
    public List<Path> inputs() {
        List<Path> all = new ArrayList<>();
        all.add(file);
        all.addAll(alsoRead);
        return all;
    }

    /** The file's own name, without folders. */
    public String fileName() {
        Path f = file.getFileName();
        return f == null ? file.toString() : f.toString();
    }
}
