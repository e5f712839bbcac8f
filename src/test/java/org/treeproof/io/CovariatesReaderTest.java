package org.treeproof.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.treeproof.data.InputException;
import org.treeproof.explain.Covariate;
import org.treeproof.explain.CovariateKind;

class CovariatesReaderTest {
    @TempDir
    Path tmp;

    private Path file(String name, String text) throws Exception {
        Path p = tmp.resolve(name);
        Files.writeString(p, text);
        return p;
    }

    @Test
    void kindsAreDetectedMissingValuesReadAndStudyOrderKept() throws Exception {
        Path f = file("c.csv", "id,batch,age,code,site\n"
                + "b,1,31.5,0,x\nextra,2,40,1,y\na,2,NA,1,\nc,1,22,0,z\nd,2,50,1,x\ne,1,61,0,NA\nf,2,19,1,x\ng,1,45,0,y\n");
        List<String> ids = List.of("a", "b", "c", "d", "e", "f", "g");
        List<Covariate> c = CovariatesReader.read(f, ids, Map.of());
        assertEquals(List.of("batch", "age", "code", "site"), c.stream().map(Covariate::name).toList());
        // two distinct numbers: codes of categories; six distinct numbers: numeric
        assertEquals(CovariateKind.CATEGORICAL, c.get(0).kind());
        assertEquals(CovariateKind.NUMERIC, c.get(1).kind());
        assertArrayEquals(new String[] {"2", "1", "1", "2", "1", "2", "1"}, c.get(0).categories());
        assertTrue(Double.isNaN(c.get(1).values()[0]));
        assertEquals(31.5, c.get(1).values()[1]);
        assertArrayEquals(new String[] {null, "x", "z", "x", null, "x", "y"}, c.get(3).categories());
        List<Covariate> declared = CovariatesReader.read(f, ids, CovariatesReader.kinds(List.of("code=numeric",
                "age=categorical")));
        assertEquals(CovariateKind.NUMERIC, declared.get(2).kind());
        assertEquals(CovariateKind.CATEGORICAL, declared.get(1).kind());
    }

    @Test
    void tabsComeFromTheFileName() throws Exception {
        Path f = file("c.tsv", "id\tsex\na\tf\nb\tm\n");
        assertEquals(CovariateKind.CATEGORICAL, CovariatesReader.read(f, List.of("a", "b"), Map.of()).get(0).kind());
    }

    @Test
    void problemsNameFileLineAndColumn() throws Exception {
        Path f = file("c.csv", "id,batch\na,1\nb\n");
        InputException e = assertThrows(InputException.class, () -> CovariatesReader.read(f, List.of("a", "b"), Map.of()));
        assertTrue(e.getMessage().contains("c.csv:3:2: 1 cells; the header has 2"), e.getMessage());
        Path twice = file("t.csv", "id,batch,batch\na,1,2\n");
        e = assertThrows(InputException.class, () -> CovariatesReader.read(twice, List.of("a"), Map.of()));
        assertTrue(e.getMessage().contains("t.csv:1:3: covariate 'batch' is named again"), e.getMessage());
        Path dup = file("d.csv", "id,batch\na,1\na,2\n");
        e = assertThrows(InputException.class, () -> CovariatesReader.read(dup, List.of("a"), Map.of()));
        assertTrue(e.getMessage().contains("d.csv:3:1: sample 'a' is listed again (first at line 2)"), e.getMessage());
        e = assertThrows(InputException.class, () -> CovariatesReader.kinds(List.of("age")));
        assertTrue(e.getMessage().startsWith("--covariate-kind: 'age'"), e.getMessage());
        e = assertThrows(InputException.class, () -> CovariatesReader.kinds(List.of("age=ordinal")));
        assertTrue(e.getMessage().contains("unknown covariate kind 'ordinal'"), e.getMessage());
    }
}
