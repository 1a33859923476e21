package org.nullpath.report;

/** HTML text escaping for the report. */
final class Html {
    private Html() {
    }

    /** {@code text} with the five characters that HTML gives meaning to replaced by entities. */
    static String escape(String text) {
        StringBuilder sb = new StringBuilder(text.length() + 16);
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case '&' -> sb.append("&amp;");
                case '<' -> sb.append("&lt;");
                case '>' -> sb.append("&gt;");
                case '"' -> sb.append("&quot;");
                case '\'' -> sb.append("&#39;");
                default -> sb.append(c);
            }
        }
        return sb.toString();
    }

    /** A name made safe for an id attribute: letters, digits, '-' and '_' only. */
    static String id(String name) {
        StringBuilder sb = new StringBuilder();
        for (char c : name.toCharArray()) {
            sb.append(Character.isLetterOrDigit(c) && c < 128 || c == '-' || c == '_' ? c : '_');
        }
        return sb.toString();
    }
}
