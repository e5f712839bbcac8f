package org.treeproof.chart;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.treeproof.explain.Explanation;
import org.treeproof.report.ExplainFigures;

/** Draws the explanation's charts: {@code features} and {@code sensitivity}, when their results exist. */
public final class ExplainCharts {
    private ExplainCharts() {
    }

    /** Draws into {@code chartsDir}; returns the figures drawn, features first. */
    public static List<Figure> drawAll(Explanation e, Path chartsDir) throws IOException {
        Objects.requireNonNull(e, "e");
        if (System.getProperty("java.awt.headless") == null) {
            System.setProperty("java.awt.headless", "true");
        }
        Files.createDirectories(chartsDir);
        var out = new ArrayList<Figure>();
        if (e.features() != null) {
            var c = new FeatureChart(e.features(), ExplainFigures.perCluster(e.features().clusters()));
            out.add(new Figure("features", "What sets each cluster apart", c.write(chartsDir, "features"), c.width(),
                    c.height(), ""));
        }
        if (e.sensitivity() != null && !e.sensitivity().ran().isEmpty()) {
            var c = new SensitivityChart(e.sensitivity());
            out.add(new Figure("sensitivity", "Other analyses against the chosen clusters", c.write(chartsDir, "sensitivity"),
                    c.width(), c.height(), ""));
        }
        return out;
    }
}
