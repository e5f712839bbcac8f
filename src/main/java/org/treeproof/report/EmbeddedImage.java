package org.treeproof.report;

import java.util.Base64;
import java.util.Objects;
import java.util.Set;

/**
 * A drawn chart handed to {@link HtmlReport} to embed as a data URI, so the report needs no other file.
 *
 * @param figureId the {@link Figure#id()} the image draws
 * @param mimeType {@code image/png}, {@code image/svg+xml} or {@code image/jpeg}
 * @param bytes    the image file's bytes (copied in and out)
 */
public record EmbeddedImage(String figureId, String mimeType, byte[] bytes) {
    private static final Set<String> TYPES = Set.of("image/png", "image/svg+xml", "image/jpeg");

    public EmbeddedImage {
        Objects.requireNonNull(figureId, "figureId");
        if (!TYPES.contains(mimeType)) {
            throw new IllegalArgumentException("image type '" + mimeType + "' cannot be embedded; use one of " + TYPES);
        }
        if (bytes.length == 0) {
            throw new IllegalArgumentException("the image for '" + figureId + "' is empty");
        }
        bytes = bytes.clone();
    }

    @Override
    public byte[] bytes() {
        return bytes.clone();
    }

    /** The image as a {@code data:} URI (RFC 2397) with base64 content. */
    public String dataUri() {
        return "data:" + mimeType + ";base64," + Base64.getEncoder().encodeToString(bytes);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof EmbeddedImage e && e.figureId.equals(figureId) && e.mimeType.equals(mimeType)
                && java.util.Arrays.equals(e.bytes, bytes);
    }

    @Override
    public int hashCode() {
        return 31 * figureId.hashCode() + java.util.Arrays.hashCode(bytes);
    }

    @Override
    public String toString() {
        return "EmbeddedImage[" + figureId + ", " + mimeType + ", " + bytes.length + " bytes]";
    }
}
