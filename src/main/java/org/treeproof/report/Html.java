package org.treeproof.report;

import org.apache.commons.text.StringEscapeUtils;

/**
 * A small HTML writer in which every piece of text and every attribute value passes through
 * {@link StringEscapeUtils#escapeHtml4}; markup comes only from the tag and attribute names the renderer passes
 * as constants. Attribute values are always double-quoted, which escapeHtml4 protects.
 */
final class Html {
    private final StringBuilder sb = new StringBuilder(1 << 16);

    static String escape(String text) {
        return StringEscapeUtils.escapeHtml4(text);
    }

    /** Opens {@code tag} with attributes given as name, value pairs. */
    Html open(String tag, String... attributes) {
        sb.append('<').append(tag);
        if (attributes.length % 2 != 0) {
            throw new IllegalArgumentException("attributes come in name, value pairs");
        }
        for (int i = 0; i < attributes.length; i += 2) {
            if (attributes[i + 1] != null) {
                sb.append(' ').append(attributes[i]).append("=\"").append(escape(attributes[i + 1])).append('"');
            }
        }
        sb.append('>');
        return this;
    }

    Html close(String tag) {
        sb.append("</").append(tag).append('>');
        return this;
    }

    /** Escaped text. */
    Html text(String text) {
        sb.append(escape(text));
        return this;
    }

    /** {@code <tag>text</tag>}, the text escaped. */
    Html element(String tag, String text) {
        return open(tag).text(text).close(tag);
    }

    /** {@code <tag class="cls">text</tag>}, the text escaped. */
    Html element(String tag, String cls, String text) {
        return open(tag, "class", cls).text(text).close(tag);
    }

    /** Markup the renderer wrote itself (the document type, the style sheet); never user text. */
    Html markup(String constant) {
        sb.append(constant);
        return this;
    }

    Html newline() {
        sb.append('\n');
        return this;
    }

    @Override
    public String toString() {
        return sb.toString();
    }
}
