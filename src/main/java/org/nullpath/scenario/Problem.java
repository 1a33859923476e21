package org.nullpath.scenario;

import org.nullpath.mission.Printable;

/**
 * One thing wrong with a scenario, located in its file.
 *
 * @param file    the file's path as given
 * @param line    1-based line, 0 when unknown
 * @param column  1-based column, 0 when unknown
 * @param key     the dotted key path ("craft.lark.legs[0].burn.acceleration"), empty for the whole file
 * @param message what is wrong
 */
public record Problem(String file, int line, int column, String key, String message) {
    /**
     * "file:line:column: key: message", on one line: control characters of the file's text that a message
     * quotes are escaped ({@link Printable}).
     */
    public String render() {
        StringBuilder b = new StringBuilder(file);
        if (line > 0) {
            b.append(':').append(line).append(':').append(column);
        }
        b.append(": ");
        if (!key.isEmpty()) {
            b.append(key).append(": ");
        }
        return Printable.of(b.append(message).toString());
    }
}
