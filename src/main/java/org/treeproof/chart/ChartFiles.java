package org.treeproof.chart;

import de.erichseifert.vectorgraphics2d.Document;
import de.erichseifert.vectorgraphics2d.VectorGraphics2D;
import de.erichseifert.vectorgraphics2d.svg.SVGProcessor;
import de.erichseifert.vectorgraphics2d.util.PageSize;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;
import javax.imageio.ImageIO;

/**
 * Writes a painted chart as PNG (always) and SVG (where a vector copy helps), both from the same
 * {@link Painter}, so the two files cannot disagree.
 *
 * <p>The PNG is opaque RGB on white: the same input gives the same pixels and, since the PNG writer adds
 * no time stamp, the same bytes.
 *
 * <p>Nothing here sets {@code java.awt.headless}: loading a class should not change a process-wide property.
 * {@link StudyCharts#drawAll} sets it at its entry; other callers run with {@code -Djava.awt.headless=true}.
 */
final class ChartFiles {
    private static final Pattern BASE_NAME = Pattern.compile("[A-Za-z0-9][A-Za-z0-9._-]{0,120}");

    private ChartFiles() {
    }

    /** Writes {@code base.png} and, if {@code vector}, {@code base.svg} into {@code dir}; returns their names. */
    static List<String> write(Path dir, String baseName, int width, int height, boolean vector, Painter painter)
            throws IOException {
        checkBaseName(baseName);
        Files.createDirectories(dir);
        List<String> names = new ArrayList<>(2);
        String png = baseName + ".png";
        ImageIO.write(image(width, height, painter), "png", dir.resolve(png).toFile());
        names.add(png);
        if (vector) {
            String svg = baseName + ".svg";
            try (OutputStream out = Files.newOutputStream(dir.resolve(svg))) {
                svg(width, height, painter).writeTo(out);
            }
            names.add(svg);
        }
        return List.copyOf(names);
    }

    /** The chart as an opaque image of exactly {@code width} by {@code height} pixels. */
    static BufferedImage image(int width, int height, Painter painter) {
        BufferedImage img = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            Look.hints(g);
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, width, height);
            painter.paint(g);
        } finally {
            g.dispose();
        }
        return img;
    }

    private static Document svg(int width, int height, Painter painter) {
        VectorGraphics2D g = new VectorGraphics2D();
        Look.hints(g);
        g.setColor(Color.WHITE);
        g.fillRect(0, 0, width, height);
        painter.paint(g);
        g.dispose();
        return new SVGProcessor().getDocument(g.getCommands(), new PageSize(0, 0, width, height));
    }

    static void checkBaseName(String baseName) {
        if (baseName == null || !BASE_NAME.matcher(baseName).matches()) {
            throw new IllegalArgumentException("chart file base name must be letters, digits, '.', '_' or '-'"
                    + " (starting with a letter or digit), got " + baseName);
        }
    }
}
