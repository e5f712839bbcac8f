package org.treeproof.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/**
 * The committed demo tables are exactly what the seeded generator makes. To regenerate them after
 * changing the generator: {@code mvn -q test -Dtest=DemoDataTest -Dtreeproof.regenerateDemo=true}.
 */
class DemoDataTest {
    private static final Path DIR = Path.of("demo-data");

    @Test
    void committedDemoTablesEqualTheGeneratorOutput() throws IOException {
        boolean regenerate = Boolean.getBoolean("treeproof.regenerateDemo");
        for (var t : DemoDataGenerator.tables()) {
            if (regenerate) {
                Files.writeString(DIR.resolve(t.fileName()), t.csv(), StandardCharsets.UTF_8);
                Files.writeString(DIR.resolve(t.truthFileName()), t.truthCsv(), StandardCharsets.UTF_8);
            }
            assertEquals(t.csv(), Files.readString(DIR.resolve(t.fileName())), t.fileName());
            assertEquals(t.truthCsv(), Files.readString(DIR.resolve(t.truthFileName())), t.truthFileName());
        }
    }
}
