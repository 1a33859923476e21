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
                // line ends and tabs kept (the scenario echo is preformatted); other control and format
                // characters shown as code points rather than passed to the browser
                default -> sb.append(c != '\n' && c != '\t' && (Character.isISOControl(c)
                        || Character.getType(c) == Character.FORMAT) ? String.format(java.util.Locale.ROOT, "\\u%04X",
                        (int) c) : String.valueOf(c));
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
