package org.treeproof.data;

import java.util.Objects;

/**
 * Where an input table came from: the path as the user gave it, the SHA-256 of its bytes exactly as read
 * (before any decompression) and their number, so a report can prove which file it describes.
 *
 * @param path   the path or name as given, never rewritten (no absolute path is made up)
 * @param sha256 64 lower-case hexadecimal digits
 * @param bytes  the number of bytes read
 */
public record InputSource(String path, String sha256, long bytes) {
    public InputSource {
        Objects.requireNonNull(path, "path");
        Objects.requireNonNull(sha256, "sha256");
        if (path.isEmpty()) {
            throw new IllegalArgumentException("empty path");
        }
        if (!sha256.matches("[0-9a-f]{64}")) {
            throw new IllegalArgumentException("not a lower-case hex SHA-256: '" + sha256 + "'");
        }
        if (bytes < 0) {
            throw new IllegalArgumentException("negative byte count " + bytes);
        }
    }
}
