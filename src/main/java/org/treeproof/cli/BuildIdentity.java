package org.treeproof.cli;

import java.io.IOException;
import java.io.InputStream;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.DigestInputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/**
 * Which build of treeproof is running, for the checkpoint's fingerprint: the SHA-256 of the jar it runs from, so
 * that a study interrupted under one build is never resumed by another whose null model or decision rule may
 * differ under the same version number. Run from a class directory (tests, an IDE) it is {@code "classes"}, and
 * the version alone tells builds apart.
 */
final class BuildIdentity {
    private static volatile String current;

    private BuildIdentity() {
    }

    /** The running build's identity, computed once. */
    static String current() {
        String c = current;
        if (c == null) {
            c = of(codeSource());
            current = c;
        }
        return c;
    }

    /** The SHA-256 (hex) of {@code location} when it is a regular file (a jar), else {@code "classes"}. */
    static String of(Path location) {
        if (location == null || !Files.isRegularFile(location)) {
            return "classes";
        }
        MessageDigest md = sha256();
        try (InputStream in = new DigestInputStream(Files.newInputStream(location), md)) {
            in.transferTo(java.io.OutputStream.nullOutputStream());
            return HexFormat.of().formatHex(md.digest());
        } catch (IOException e) {
            return "unreadable";
        }
    }

    private static Path codeSource() {
        try {
            var source = BuildIdentity.class.getProtectionDomain().getCodeSource();
            return source == null ? null : Path.of(source.getLocation().toURI());
        } catch (URISyntaxException | IllegalArgumentException | SecurityException e) {
            return null;
        }
    }

    private static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
