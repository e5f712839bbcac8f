package org.treeproof.io;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.treeproof.data.InputException;

/**
 * Decides, before any work, whether an output directory may be written, and above all whether an existing one may
 * be replaced. treeproof only ever replaces a directory it wrote itself: every output directory carries a manifest
 * ({@value #MARKER}) listing each file treeproof put there with its SHA-256, and a directory is replaceable only
 * when it has that manifest and holds nothing else (no file the manifest does not list, no changed file, no
 * symbolic link). Whatever the manifest says, the root folder, the home folder, the current directory, any folder
 * above them and any folder holding an input file are never replaced.
 */
public final class OutputGuard {
    /** The manifest treeproof writes into every output directory; its presence marks the directory as treeproof's. */
    public static final String MARKER = ".treeproof-output";
    private static final String MARKER_TITLE = "# treeproof output directory: the files treeproof wrote (SHA-256)."
            + " treeproof --force replaces this directory only while it holds exactly these files.";

    private OutputGuard() {
    }

    /**
     * Checks that {@code out} can be written as asked, before any work.
     *
     * @param out       the directory as the user named it
     * @param option    the option that named it, for messages
     * @param replace   whether an existing directory may be replaced (--force)
     * @param protect   files the run reads (input, labels); a directory holding any of them is never replaced
     * @throws InputException with one line saying what is wrong and what to do
     */
    public static void check(Path out, String option, boolean replace, Collection<Path> protect) {
        String shown = option + " " + out;
        if (out.toString().isBlank()) {
            throw new InputException(option + ": the directory name is empty; name a new directory for the results");
        }
        Path abs = out.toAbsolutePath().normalize();
        if (abs.getParent() == null || abs.getFileName() == null) {
            throw new InputException(shown + ": is the root folder; name a new directory for the results");
        }
        if (Files.isSymbolicLink(abs)) {
            throw new InputException(shown + ": is a symbolic link" + (Files.exists(abs) ? "" : " to nothing")
                    + "; name the directory itself (treeproof renames its finished output into place)");
        }
        if (Files.exists(abs, LinkOption.NOFOLLOW_LINKS)) {
            if (!replace) {
                throw new InputException(shown + ": already exists; choose another directory or add --force");
            }
            requireReplaceable(abs, shown, protect);
        }
        requireWritableParent(abs, shown);
    }

    /**
     * Checks that the existing directory {@code dir} is one treeproof wrote and nothing else lives in it, and
     * that it is none of the folders that are never replaced.
     */
    static void requireReplaceable(Path dir, String shown, Collection<Path> protect) {
        if (!Files.isDirectory(dir, LinkOption.NOFOLLOW_LINKS)) {
            throw new InputException(shown + ": exists and is not a directory; --force replaces only a directory "
                    + "treeproof wrote");
        }
        Path real = realPath(dir, shown);
        String never = neverReplaced(real, protect);
        if (never != null) {
            throw new InputException(shown + ": " + never + "; --force never replaces it. Choose a new directory for "
                    + "the results");
        }
        Path marker = real.resolve(MARKER);
        if (!Files.isRegularFile(marker, LinkOption.NOFOLLOW_LINKS)) {
            throw new InputException(shown + ": was not written by treeproof (it has no " + MARKER + " file); "
                    + "--force replaces only treeproof's own output. Choose another directory, or remove it yourself");
        }
        Map<String, String> listed = readManifest(marker, shown);
        String foreign = firstForeign(real, listed, shown);
        if (foreign != null) {
            throw new InputException(shown + ": " + foreign + "; --force replaces only what treeproof wrote. Move it "
                    + "out first, or choose another directory");
        }
    }

    /** Why {@code real} must never be replaced, or null. */
    private static String neverReplaced(Path real, Collection<Path> protect) {
        if (real.getParent() == null) {
            return "is the root folder";
        }
        Path home = realOrNull(Path.of(System.getProperty("user.home", "/")));
        if (home != null && home.startsWith(real)) {
            return home.equals(real) ? "is the home folder" : "holds the home folder";
        }
        Path cwd = realOrNull(Path.of("").toAbsolutePath());
        if (cwd != null && cwd.startsWith(real)) {
            return cwd.equals(real) ? "is the current directory" : "holds the current directory";
        }
        for (Path p : protect) {
            if (p == null) {
                continue;
            }
            Path rp = realOrNull(p.toAbsolutePath());
            Path candidate = rp != null ? rp : p.toAbsolutePath().normalize();
            if (candidate.startsWith(real)) {
                return "holds the input file " + p;
            }
        }
        return null;
    }

    /** The first thing in {@code dir} the manifest does not account for, described for the user; or null. */
    private static String firstForeign(Path dir, Map<String, String> listed, String shown) {
        try (Stream<Path> walk = Files.walk(dir)) {
            for (Path p : (Iterable<Path>) walk::iterator) {
                if (p.equals(dir)) {
                    continue;
                }
                String rel = relative(dir, p);
                if (rel.equals(MARKER)) {
                    continue;
                }
                if (Files.isSymbolicLink(p)) {
                    return "holds the symbolic link " + rel + ", which treeproof did not write";
                }
                if (Files.isDirectory(p, LinkOption.NOFOLLOW_LINKS)) {
                    String prefix = rel + "/";
                    if (listed.keySet().stream().noneMatch(k -> k.startsWith(prefix))) {
                        return "holds the folder " + rel + ", which treeproof did not write";
                    }
                    continue;
                }
                String sha = listed.get(rel);
                if (sha == null) {
                    return "holds " + rel + ", which treeproof did not write";
                }
                if (!sha.equals(sha256(p))) {
                    return rel + " was changed after treeproof wrote it";
                }
            }
            return null;
        } catch (IOException e) {
            throw new InputException(shown + ": cannot look inside it (" + describe(e) + ")");
        }
    }

    private static Map<String, String> readManifest(Path marker, String shown) {
        var out = new LinkedHashMap<String, String>();
        try {
            for (String line : Files.readAllLines(marker, StandardCharsets.UTF_8)) {
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                int space = line.indexOf("  ");
                if (space != 64) {
                    throw new InputException(shown + ": its " + MARKER + " file is damaged; --force replaces only a "
                            + "directory treeproof wrote. Remove it yourself or choose another directory");
                }
                out.put(line.substring(space + 2), line.substring(0, space));
            }
        } catch (IOException e) {
            throw new InputException(shown + ": cannot read its " + MARKER + " file (" + describe(e) + ")");
        }
        return out;
    }

    /**
     * The manifest of the finished directory {@code dir}: every regular file in it, with its SHA-256, in a stable
     * order.
     */
    static byte[] manifestOf(Path dir) throws IOException {
        List<String> lines = new ArrayList<>();
        lines.add(MARKER_TITLE);
        try (Stream<Path> walk = Files.walk(dir)) {
            for (Path p : (Iterable<Path>) walk.sorted()::iterator) {
                if (Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS) && !relative(dir, p).equals(MARKER)) {
                    lines.add(sha256(p) + "  " + relative(dir, p));
                }
            }
        }
        return (String.join("\n", lines) + "\n").getBytes(StandardCharsets.UTF_8);
    }

    /** Refuses an output whose nearest existing ancestor is not a writable directory. */
    private static void requireWritableParent(Path abs, String shown) {
        Path p = abs.getParent();
        while (p != null && !Files.exists(p)) {
            p = p.getParent();
        }
        if (p == null) {
            return;
        }
        if (!Files.isDirectory(p)) {
            throw new InputException(shown + ": " + p + " is a file, not a folder; name a directory for the results");
        }
        if (!Files.isWritable(p)) {
            throw new InputException(shown + ": cannot create it in " + p + ": that folder is not writable (permission "
                    + "denied, or a read-only file system); choose a folder you can write to");
        }
    }

    /** A short cause for an I/O failure: "permission denied" instead of the JDK's bare path. */
    public static String describe(IOException e) {
        if (e instanceof AccessDeniedException) {
            return "permission denied";
        }
        String m = e.getMessage();
        return m == null ? e.getClass().getSimpleName() : m;
    }

    private static String relative(Path dir, Path p) {
        return dir.relativize(p).toString().replace('\\', '/');
    }

    private static Path realPath(Path p, String shown) {
        try {
            return p.toRealPath();
        } catch (IOException e) {
            throw new InputException(shown + ": cannot resolve it (" + describe(e) + ")");
        }
    }

    private static Path realOrNull(Path p) {
        try {
            return p.toRealPath();
        } catch (IOException e) {
            return null;
        }
    }

    static String sha256(Path file) throws IOException {
        try (InputStream in = Files.newInputStream(file, LinkOption.NOFOLLOW_LINKS)) {
            MessageDigest md = MessageDigest.getInstance("SHA-256");
            byte[] buf = new byte[1 << 16];
            for (int n; (n = in.read(buf)) > 0; ) {
                md.update(buf, 0, n);
            }
            return HexFormat.of().formatHex(md.digest());
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
