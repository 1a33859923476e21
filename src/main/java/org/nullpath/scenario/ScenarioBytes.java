package org.nullpath.scenario;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import static org.nullpath.scenario.ScenarioLoader.MAX_FILE_BYTES;

/** Reading a scenario's bytes: size limit, UTF-8 decoding with the place of a bad byte, byte order mark. */
final class ScenarioBytes {
    private ScenarioBytes() {
    }

    static String readFile(Path file, String name) throws ScenarioException {
        if (Files.isDirectory(file)) {
            throw single(name, "cannot read the scenario: it is a directory, not a file");
        }
        byte[] bytes;
        try {
            long size = Files.size(file);
            if (size > MAX_FILE_BYTES) {
                throw single(name, tooLarge(size));
            }
            try (InputStream in = Files.newInputStream(file)) {
                bytes = in.readNBytes((int) MAX_FILE_BYTES + 1);
            }
        } catch (NoSuchFileException e) {
            throw single(name, "cannot read the scenario: no such file");
        } catch (AccessDeniedException e) {
            throw single(name, "cannot read the scenario: permission denied");
        } catch (IOException | SecurityException e) {
            throw single(name, "cannot read the scenario: " + e.getMessage());
        }
        if (bytes.length > MAX_FILE_BYTES) {
            throw single(name, tooLarge(bytes.length));
        }
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        CharBuffer out = CharBuffer.allocate(bytes.length + 1);
        CoderResult r = decoder.decode(in, out, true);
        if (!r.isError()) {
            r = decoder.flush(out);
        }
        if (r.isError()) {
            int offset = in.position();
            int line = 1;
            int lineStart = 0;
            for (int i = 0; i < offset; i++) {
                if (bytes[i] == '\n') {
                    line++;
                    lineStart = i + 1;
                }
            }
            throw new ScenarioException(List.of(new Problem(name, line, offset - lineStart + 1, "",
                    String.format(Locale.ROOT, "the file is not UTF-8 text: byte 0x%02X cannot start a character here",
                            bytes[offset] & 0xff))));
        }
        out.flip();
        return stripBom(out.toString());
    }

    static String stripBom(String text) {
        return text.startsWith("\uFEFF") ? text.substring(1) : text;
    }

    static String tooLarge(long bytes) {
        return "the scenario is " + bytes + " bytes long; nullpath reads scenario files of at most 4 MiB ("
                + MAX_FILE_BYTES + " bytes)";
    }

    static ScenarioException single(String file, String message) {
        return new ScenarioException(List.of(new Problem(file, 0, 0, "", message)));
    }

    /** Scenario text given directly: refused when over the size limit, byte order mark removed. */
    static String checkedText(String text, String displayName) throws ScenarioException {
        long bytes = text.length() > MAX_FILE_BYTES ? text.length()
                : text.getBytes(StandardCharsets.UTF_8).length;
        if (bytes > MAX_FILE_BYTES) {
            throw single(displayName, tooLarge(bytes));
        }
        return stripBom(text);
    }

    /** The path a scenario given as text is named by (its display name, when that is a path). */
    static Path pathOf(String displayName) {
        try {
            return Path.of(displayName);
        } catch (InvalidPathException e) {
            return Path.of("scenario.yaml");
        }
    }
}
