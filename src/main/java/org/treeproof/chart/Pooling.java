package org.treeproof.chart;

import java.awt.image.BufferedImage;
import java.util.function.DoubleToIntFunction;

/**
 * Turns a large matrix into one image pixel per screen pixel by averaging the cells each pixel covers
 * (mean pooling), so a 2000 by 2000 matrix costs one pass over its cells and one small image, never
 * millions of drawn rectangles. Where the matrix is smaller than the image, cells are repeated instead.
 */
final class Pooling {
    /** One matrix cell; NaN means no value and is left out of the mean. */
    @FunctionalInterface
    interface Cell {
        double at(int row, int col);
    }

    private Pooling() {
    }

    /**
     * The first source index of each output pixel and, last, the end: pixel {@code p} covers
     * {@code [start[p], start[p+1])}, never empty.
     */
    static int[] starts(int n, int out) {
        int[] s = new int[out + 1];
        for (int p = 0; p <= out; p++) {
            s[p] = (int) ((long) p * n / out);
        }
        return s;
    }

    /** Means over the blocks, row-major {@code outRows} by {@code outCols}; NaN where a block has no value. */
    static double[] means(int rows, int cols, int outRows, int outCols, Cell cell) {
        int[] rs = starts(rows, outRows);
        int[] cs = starts(cols, outCols);
        double[] out = new double[outRows * outCols];
        for (int pr = 0; pr < outRows; pr++) {
            int r0 = rs[pr];
            int r1 = Math.max(r0 + 1, rs[pr + 1]);
            for (int pc = 0; pc < outCols; pc++) {
                int c0 = cs[pc];
                int c1 = Math.max(c0 + 1, cs[pc + 1]);
                double sum = 0;
                int count = 0;
                for (int r = r0; r < r1; r++) {
                    for (int c = c0; c < c1; c++) {
                        double v = cell.at(r, c);
                        if (!Double.isNaN(v)) {
                            sum += v;
                            count++;
                        }
                    }
                }
                out[pr * outCols + pc] = count == 0 ? Double.NaN : sum / count;
            }
        }
        return out;
    }

    /** An opaque image from pooled values, {@code rgb} mapping a value (or NaN) to 0xRRGGBB. */
    static BufferedImage image(double[] values, int width, int height, DoubleToIntFunction rgb) {
        BufferedImage img = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        int[] row = new int[width];
        for (int y = 0; y < height; y++) {
            for (int x = 0; x < width; x++) {
                row[x] = rgb.applyAsInt(values[y * width + x]);
            }
            img.setRGB(0, y, width, 1, row, 0, width);
        }
        return img;
    }

    /**
     * The pixel size for {@code n} cells in at most {@code max} pixels. Where cells get three pixels or more,
     * a whole multiple of {@code n}, so that every cell has the same size (a pixel more or less would show);
     * otherwise all of {@code max}, where a one-pixel difference between cells cannot be seen.
     */
    static int side(int n, int max) {
        int each = max / n;
        return each >= 3 ? n * each : max;
    }
}
