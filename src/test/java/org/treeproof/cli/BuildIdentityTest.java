package org.treeproof.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The build identity that ties a checkpoint to the jar that made it. */
class BuildIdentityTest {

    @Test
    void aJarIsIdentifiedByTheSha256OfItsBytes(@TempDir Path dir) throws IOException {
        Path jar = dir.resolve("treeproof.jar");
        Files.writeString(jar, "abc", StandardCharsets.US_ASCII);
        // FIPS 180-2, appendix B.1: SHA-256("abc")
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad", BuildIdentity.of(jar));
        Path other = dir.resolve("other.jar");
        Files.writeString(other, "abd", StandardCharsets.US_ASCII);
        assertNotEquals(BuildIdentity.of(jar), BuildIdentity.of(other));
    }

    @Test
    void aClassDirectoryHasNoChecksum(@TempDir Path dir) {
        assertEquals("classes", BuildIdentity.of(dir));
        assertEquals("classes", BuildIdentity.of(null));
    }
}
