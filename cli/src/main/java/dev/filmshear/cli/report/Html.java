package dev.filmshear.cli.report;

/**
 * Escaping of text for HTML element content and quoted attribute values. Written by hand because none of the
 * project's libraries offers an HTML escaper and the rule is five replacements: {@code & < > " '} become
 * entities, and the control characters that neither HTML nor XML allow in a document become U+FFFD, so the page
 * stays well-formed whatever a title or a case file holds.
 */
public final class Html {
    private Html() {
    }

    /** The text, safe inside an element or a double- or single-quoted attribute value. */
    public static String escape(String text) {
        StringBuilder out = new StringBuilder(text.length() + 16);
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case '&' -> out.append("&amp;");
                case '<' -> out.append("&lt;");
                case '>' -> out.append("&gt;");
                case '"' -> out.append("&quot;");
                case '\'' -> out.append("&#39;");
                default -> out.append(allowed(c) ? c : '\uFFFD');
            }
        }
        return out.toString();
    }

    /** Tab, line feed and carriage return are the only controls below U+0020 a document may carry (XML 1.0, 2.2). */
    private static boolean allowed(char c) {
        return c >= 0x20 ? c != 0xFFFE && c != 0xFFFF : c == '\t' || c == '\n' || c == '\r';
    }
}
