package org.treeproof.report;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.util.List;
import javax.imageio.ImageIO;
import org.treeproof.study.ClusterEvidence;
import org.treeproof.study.Recommendation;

/** Helpers shared by the report tests. */
final class Fixtures {
    private Fixtures() {
    }

    /**
     * Asserts that {@code printed} is {@code value} rounded to the printed precision: the two differ by at most
     * half a unit in the last printed digit ("0.97" stands for any value in [0.965, 0.975]).
     */
    static void assertPrinted(String printed, double value, String what) {
        BigDecimal p = new BigDecimal(printed.replace("−", "-"));
        BigDecimal halfUnit = BigDecimal.ONE.movePointLeft(p.scale()).divide(BigDecimal.valueOf(2));
        BigDecimal diff = p.subtract(new BigDecimal(value)).abs();
        assertTrue(diff.compareTo(halfUnit.add(new BigDecimal("1e-12"))) <= 0,
                what + ": printed " + printed + " for " + value);
    }

    /** A real PNG of the given size with one coloured square, so each figure's bytes differ. */
    static byte[] png(int seed) {
        BufferedImage img = new BufferedImage(24, 16, BufferedImage.TYPE_INT_RGB);
        var g = img.createGraphics();
        g.setColor(Color.WHITE);
        g.fillRect(0, 0, 24, 16);
        g.setColor(new Color(0x0072B2 + 97 * seed));
        g.fillRect(seed % 12, 4, 8, 8);
        g.dispose();
        var out = new ByteArrayOutputStream();
        try {
            ImageIO.write(img, "png", out);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toByteArray();
    }

    /** The model with other flagged samples (for renderer tests only: the model's other parts stay as they were). */
    static ReportModel withFlags(ReportModel m, List<Recommendation.SampleFlag> flags) {
        return new ReportModel(m.run(), m.settings(), m.rule(), m.decision(), m.evidence(), m.linkages(), m.clusters(),
                flags, m.labels(), m.effectiveSettings(), m.caution(), m.figures(), m.notes());
    }

    /** The model with other cluster records (for renderer tests only). */
    static ReportModel withClusters(ReportModel m, List<ClusterEvidence> clusters) {
        return new ReportModel(m.run(), m.settings(), m.rule(), m.decision(), m.evidence(), m.linkages(), clusters,
                m.flaggedSamples(), m.labels(), m.effectiveSettings(), m.caution(), m.figures(), m.notes());
    }
}
