package org.nullpath.mission;

/**
 * Text from a scenario made safe to print on a terminal or in one line of a log: control characters
 * (line breaks, escape sequences) and the invisible characters that reorder or hide text (Unicode format
 * characters such as bidirectional overrides) are written as {@code \\uXXXX}, so that no scenario can move
 * the cursor, recolour a terminal or split one problem over two lines.
 */
public final class Printable {
    private Printable() {
    }

    /** {@code text} with every control and format character escaped as {@code \\uXXXX}. */
    public static String of(String text) {
        StringBuilder b = null;
        for (int i = 0; i < text.length(); i++) {
            char ch = text.charAt(i);
            if (unsafe(ch)) {
                if (b == null) {
                    b = new StringBuilder(text.length() + 16).append(text, 0, i);
                }
                b.append(String.format(java.util.Locale.ROOT, "\\u%04X", (int) ch));
            } else if (b != null) {
                b.append(ch);
            }
        }
        return b == null ? text : b.toString();
    }

    /** True when {@code text} holds a character {@link #of} would escape. */
    public static boolean hasUnsafe(String text) {
        return text.chars().anyMatch(c -> unsafe((char) c));
    }

    private static boolean unsafe(char ch) {
        return Character.isISOControl(ch) || Character.getType(ch) == Character.FORMAT
                || ch == '\u2028' || ch == '\u2029';
    }
}
