package org.treeproof.chart;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;
import org.w3c.dom.Document;

/** Assertions shared by the rendering tests: file names, pixel size, SVG well-formedness, determinism. */
final class RenderChecks {
    /** Writes a chart into a directory with a base name and returns the written names. */
    @FunctionalInterface
    interface Writer {
        List<String> write(Path dir, String baseName) throws IOException;
    }

    private RenderChecks() {
    }

    /**
     * Renders twice into separate directories and checks: the names, a PNG of the expected size that is not
     * blank, an SVG (when expected) that parses as XML with the same size, and byte-identical files.
     * Returns the decoded PNG.
     */
    static BufferedImage check(Writer w, Path tmp, String base, int width, int height, boolean svg) throws Exception {
        Path a = tmp.resolve("a");
        Path b = tmp.resolve("b");
        List<String> names = w.write(a, base);
        assertEquals(svg ? List.of(base + ".png", base + ".svg") : List.of(base + ".png"), names);
        assertEquals(names, w.write(b, base));
        BufferedImage img = ImageIO.read(a.resolve(base + ".png").toFile());
        assertEquals(width, img.getWidth(), "PNG width");
        assertEquals(height, img.getHeight(), "PNG height");
        assertTrue(nonWhiteShare(img) > 0.01, "PNG is nearly blank");
        assertTrue(distinctColours(img) > 20, "PNG has almost no colours");
        for (String name : names) {
            assertArrayEquals(Files.readAllBytes(a.resolve(name)), Files.readAllBytes(b.resolve(name)),
                    name + " differs between two renders of the same input");
        }
        if (svg) {
            Document doc = parse(a.resolve(base + ".svg"));
            assertEquals("svg", doc.getDocumentElement().getTagName());
            assertEquals(width + "px", doc.getDocumentElement().getAttribute("width"));
            assertEquals(height + "px", doc.getDocumentElement().getAttribute("height"));
            assertTrue(doc.getElementsByTagName("path").getLength() > 0, "SVG draws no paths");
            assertEquals(0, doc.getElementsByTagName("text").getLength(), "text should be outlines");
        }
        return img;
    }

    /** Parses without fetching the DTD the SVG names, which is not needed to check well-formedness. */
    static Document parse(Path file) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setValidating(false);
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        return f.newDocumentBuilder().parse(file.toFile());
    }

    static double nonWhiteShare(BufferedImage img) {
        long count = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                count += (img.getRGB(x, y) & 0xFFFFFF) != 0xFFFFFF ? 1 : 0;
            }
        }
        return (double) count / ((long) img.getWidth() * img.getHeight());
    }

    static int distinctColours(BufferedImage img) {
        Set<Integer> s = new HashSet<>();
        for (int y = 0; y < img.getHeight(); y += 2) {
            for (int x = 0; x < img.getWidth(); x += 2) {
                s.add(img.getRGB(x, y) & 0xFFFFFF);
            }
        }
        return s.size();
    }

    /** Pixels exactly of colour {@code c}. */
    static long count(BufferedImage img, Color c) {
        int rgb = c.getRGB() & 0xFFFFFF;
        long n = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                n += (img.getRGB(x, y) & 0xFFFFFF) == rgb ? 1 : 0;
            }
        }
        return n;
    }

    /** The top row of the strip of cluster colours under the leaves (the lowest run of such rows), or -1. */
    static int stripTop(BufferedImage img, int k) {
        for (int y = img.getHeight() - 1; y > 0; y--) {
            if (clusterShare(img, y, k) > 0.5) {
                int top = y;
                while (top > 0 && clusterShare(img, top - 1, k) > 0.5) {
                    top--;
                }
                return top;
            }
        }
        return -1;
    }

    /**
     * Row {@code y} just above the leaves, across the strip's width: if every stem were drawn, stems closer than
     * a pixel or two would merge into (nearly) solid cluster colour. A pixel counts as solid when it is at least
     * 85% of the way from white to the nearest cluster colour; the wedge drawing, lightened towards white, keeps
     * such pixels to a small share.
     */
    static void assertNoSmear(BufferedImage img, int y, int k) {
        int stripY = y + 8;
        int left = 0;
        while (left < img.getWidth() && !isCluster(img.getRGB(left, stripY) & 0xFFFFFF, k)) {
            left++;
        }
        int right = img.getWidth() - 1;
        while (right > left && !isCluster(img.getRGB(right, stripY) & 0xFFFFFF, k)) {
            right--;
        }
        int solid = 0;
        int inked = 0;
        for (int x = left; x <= right; x++) {
            int rgb = img.getRGB(x, y) & 0xFFFFFF;
            double cover = coverage(rgb, k);
            inked += cover > 0.05 ? 1 : 0;
            solid += cover >= 0.85 ? 1 : 0;
        }
        int width = right - left + 1;
        assertTrue(inked > width / 2, "little drawing just above the leaves: " + inked + " of " + width);
        assertTrue(solid < width * 0.15, "solid branch colour covers " + solid + " of " + width + " pixels");
    }

    /** How far {@code rgb} lies from white towards the nearest cluster colour, 0 (white) to 1 (the colour). */
    private static double coverage(int rgb, int k) {
        double best = 0;
        for (int c = 0; c < k; c++) {
            Color col = ChartColors.cluster(c);
            double[] p = {(rgb >> 16) & 0xFF, (rgb >> 8) & 0xFF, rgb & 0xFF};
            double[] q = {col.getRed(), col.getGreen(), col.getBlue()};
            // project the pixel on the segment white -> colour
            double num = 0;
            double den = 0;
            double off = 0;
            for (int i = 0; i < 3; i++) {
                num += (255 - p[i]) * (255 - q[i]);
                den += (255 - q[i]) * (255 - q[i]);
            }
            double t = den == 0 ? 0 : Math.max(0, Math.min(1, num / den));
            for (int i = 0; i < 3; i++) {
                double e = p[i] - (255 - t * (255 - q[i]));
                off += e * e;
            }
            if (off < 30 * 30) {
                best = Math.max(best, t);
            }
        }
        return best;
    }

    private static double clusterShare(BufferedImage img, int y, int k) {
        int hits = 0;
        for (int x = 0; x < img.getWidth(); x++) {
            hits += isCluster(img.getRGB(x, y) & 0xFFFFFF, k) ? 1 : 0;
        }
        return (double) hits / img.getWidth();
    }

    private static boolean isCluster(int rgb, int k) {
        for (int c = 0; c < k; c++) {
            if (rgb == (ChartColors.cluster(c).getRGB() & 0xFFFFFF)) {
                return true;
            }
        }
        return false;
    }
}
