package org.treeproof.arch;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Keeps the import directions of the package table in the design true: the pure core never reaches
 * the study, I/O, report, chart or CLI layers, only {@code chart} touches XChart, only {@code spark} touches
 * Apache Spark (and the one {@code cli} class that starts it), and nothing imports the CLI.
 */
class ArchitectureTest {
    private static JavaClasses classes;

    @BeforeAll
    static void load() {
        classes = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.treeproof");
    }

    private static final String[] OUTER = {"org.treeproof.study..", "org.treeproof.io..",
        "org.treeproof.report..", "org.treeproof.chart..", "org.treeproof.cli.."};

    @Test
    void dataAndPartitionImportOnlyTheJdk() {
        noClasses().that().resideInAnyPackage("org.treeproof.data..", "org.treeproof.partition..")
                .should().dependOnClassesThat().resideInAnyPackage("org.treeproof.distance..", "org.treeproof.tree..",
                        "org.treeproof.score..", "org.treeproof.resample..", "org.treeproof.study..",
                        "org.treeproof.io..", "org.treeproof.report..", "org.treeproof.chart..", "org.treeproof.cli..")
                .check(classes);
        noClasses().that().resideInAnyPackage("org.treeproof.data..", "org.treeproof.partition..")
                .should().dependOnClassesThat().resideOutsideOfPackages("java..", "org.treeproof.data..",
                        "org.treeproof.partition..")
                .check(classes);
    }

    @Test
    void distanceImportsOnlyData() {
        noClasses().that().resideInAPackage("org.treeproof.distance..")
                .should().dependOnClassesThat().resideInAnyPackage("org.treeproof.tree..", "org.treeproof.partition..",
                        "org.treeproof.score..", "org.treeproof.resample..")
                .orShould().dependOnClassesThat().resideInAnyPackage(OUTER)
                .check(classes);
    }

    @Test
    void treeImportsOnlyDistanceDataAndPartition() {
        noClasses().that().resideInAPackage("org.treeproof.tree..")
                .should().dependOnClassesThat().resideInAnyPackage("org.treeproof.score..", "org.treeproof.resample..")
                .orShould().dependOnClassesThat().resideInAnyPackage(OUTER)
                .check(classes);
    }

    @Test
    void coreNeverReachesOuterLayers() {
        noClasses().that().resideInAnyPackage("org.treeproof.score..", "org.treeproof.resample..",
                        "org.treeproof.explain..")
                .should().dependOnClassesThat().resideInAnyPackage(OUTER)
                .check(classes);
    }

    @Test
    void studyDoesNoRenderingOrCli() {
        noClasses().that().resideInAPackage("org.treeproof.study..")
                .should().dependOnClassesThat().resideInAnyPackage("org.treeproof.io..", "org.treeproof.report..",
                        "org.treeproof.chart..", "org.treeproof.cli..")
                .check(classes);
    }

    @Test
    void reportIsRenderedWithoutChartsOrCli() {
        noClasses().that().resideInAnyPackage("org.treeproof.report..", "org.treeproof.io..")
                .should().dependOnClassesThat().resideInAnyPackage("org.treeproof.chart..", "org.treeproof.cli..")
                .check(classes);
    }

    @Test
    void onlyChartImportsXChart() {
        noClasses().that().resideOutsideOfPackage("org.treeproof.chart..")
                .should().dependOnClassesThat().resideInAnyPackage("org.knowm.xchart..", "de.erichseifert..")
                .check(classes);
    }

    @Test
    void onlySparkAndCliImportSpark() {
        noClasses().that().resideOutsideOfPackages("org.treeproof.spark..", "org.treeproof.cli..")
                .should().dependOnClassesThat().resideInAnyPackage("org.apache.spark..", "scala..")
                .check(classes);
    }

    @Test
    void nothingButTheCliImportsTheSparkPackage() {
        noClasses().that().resideOutsideOfPackages("org.treeproof.spark..", "org.treeproof.cli..")
                .should().dependOnClassesThat().resideInAPackage("org.treeproof.spark..")
                .check(classes);
    }

    /** Spark is loaded only when chosen: one small class of the command line stands between it and the rest. */
    @Test
    void theCliReachesSparkOnlyThroughSparkRun() {
        noClasses().that().resideInAPackage("org.treeproof.cli..").and().doNotHaveSimpleName("SparkRun")
                .should().dependOnClassesThat().resideInAnyPackage("org.treeproof.spark..", "org.apache.spark..",
                        "scala..")
                .check(classes);
        noClasses().that().haveSimpleName("SparkRun")
                .should().dependOnClassesThat().resideInAnyPackage("org.apache.spark..", "scala..")
                .check(classes);
    }

    @Test
    void nothingImportsTheCli() {
        noClasses().that().resideOutsideOfPackage("org.treeproof.cli..")
                .should().dependOnClassesThat().resideInAPackage("org.treeproof.cli..")
                .check(classes);
    }

    @Test
    void coreHasNoConsoleOrFileIo() {
        noClasses().that().resideInAnyPackage("org.treeproof.data..", "org.treeproof.distance..",
                        "org.treeproof.tree..", "org.treeproof.partition..", "org.treeproof.score..",
                        "org.treeproof.resample..", "org.treeproof.study..", "org.treeproof.explain..")
                .should().accessField(System.class, "out").orShould().accessField(System.class, "err")
                .orShould().dependOnClassesThat().resideInAnyPackage("java.nio.file..", "java.net..")
                .check(classes);
    }
}
