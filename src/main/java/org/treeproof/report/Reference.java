package org.treeproof.report;

import java.util.Objects;

/**
 * A published source the report cites: how it is cited in the text, the full entry, and its DOI.
 *
 * <p>The entries are those cited in the javadoc of the classes that implement each method; Şenbabaoğlu et al. and
 * Ward were checked against the publishers' pages, the rest are as the implementing classes cite them.
 *
 * @param cite  the citation in running text, e.g. "Hubert &amp; Arabie, 1985"
 * @param entry the full entry without the DOI
 * @param doi   the DOI, without a resolver prefix; empty for a book without one (its ISBN is in the entry)
 */
public record Reference(String cite, String entry, String doi) {
    public Reference {
        Objects.requireNonNull(cite, "cite");
        Objects.requireNonNull(entry, "entry");
        Objects.requireNonNull(doi, "doi");
    }

    /** The citation as the subject of a sentence: "Hubert &amp; Arabie (1985)". */
    public String narrative() {
        int comma = cite.lastIndexOf(", ");
        return cite.substring(0, comma) + " (" + cite.substring(comma + 2) + ")";
    }

    /** The DOI as a resolvable address. */
    public String url() {
        return "https://doi.org/" + doi;
    }

    static final Reference HUBERT_ARABIE = new Reference("Hubert & Arabie, 1985",
            "Hubert, L. & Arabie, P. (1985). Comparing partitions. Journal of Classification, 2, 193–218.",
            "10.1007/BF01908075");
    static final Reference MONTI = new Reference("Monti et al., 2003",
            "Monti, S., Tamayo, P., Mesirov, J. & Golub, T. (2003). Consensus clustering: a resampling-based method "
                    + "for class discovery and visualization of gene expression microarray data. Machine Learning, 52, "
                    + "91–118.", "10.1023/A:1023949509487");
    static final Reference SENBABAOGLU = new Reference("Şenbabaoğlu et al., 2014",
            "Şenbabaoğlu, Y., Michailidis, G. & Li, J. Z. (2014). Critical limitations of consensus clustering in "
                    + "class discovery. Scientific Reports, 4, 6207.", "10.1038/srep06207");
    static final Reference HENNIG = new Reference("Hennig, 2007",
            "Hennig, C. (2007). Cluster-wise assessment of cluster stability. Computational Statistics & Data "
                    + "Analysis, 52, 258–271.", "10.1016/j.csda.2006.11.025");
    static final Reference ROUSSEEUW = new Reference("Rousseeuw, 1987",
            "Rousseeuw, P. J. (1987). Silhouettes: a graphical aid to the interpretation and validation of cluster "
                    + "analysis. Journal of Computational and Applied Mathematics, 20, 53–65.",
            "10.1016/0377-0427(87)90125-7");
    static final Reference TIBSHIRANI = new Reference("Tibshirani et al., 2001",
            "Tibshirani, R., Walther, G. & Hastie, T. (2001). Estimating the number of clusters in a data set via the "
                    + "gap statistic. Journal of the Royal Statistical Society: Series B, 63, 411–423.",
            "10.1111/1467-9868.00293");
    static final Reference KAUFMAN_ROUSSEEUW = new Reference("Kaufman & Rousseeuw, 1990",
            "Kaufman, L. & Rousseeuw, P. J. (1990). Finding Groups in Data: An Introduction to Cluster Analysis. "
                    + "Wiley, New York.", "10.1002/9780470316801");
    static final Reference CALINSKI_HARABASZ = new Reference("Caliński & Harabasz, 1974",
            "Caliński, T. & Harabasz, J. (1974). A dendrite method for cluster analysis. Communications in "
                    + "Statistics, 3, 1–27.", "10.1080/03610927408827101");
    static final Reference DAVIES_BOULDIN = new Reference("Davies & Bouldin, 1979",
            "Davies, D. L. & Bouldin, D. W. (1979). A cluster separation measure. IEEE Transactions on Pattern "
                    + "Analysis and Machine Intelligence, 1, 224–227.", "10.1109/TPAMI.1979.4766909");
    static final Reference DUNN = new Reference("Dunn, 1974",
            "Dunn, J. C. (1974). Well-separated clusters and optimal fuzzy partitions. Journal of Cybernetics, 4, "
                    + "95–104.", "10.1080/01969727408546059");
    static final Reference HOPE = new Reference("Hope, 1968",
            "Hope, A. C. A. (1968). A simplified Monte Carlo significance test procedure. Journal of the Royal "
                    + "Statistical Society: Series B, 30, 582–598.", "10.1111/j.2517-6161.1968.tb00759.x");
    static final Reference LIU = new Reference("Liu et al., 2008",
            "Liu, Y., Hayes, D. N., Nobel, A. & Marron, J. S. (2008). Statistical significance of clustering for "
                    + "high-dimension, low-sample size data. Journal of the American Statistical Association, 103, "
                    + "1281–1293.", "10.1198/016214508000000454");
    static final Reference ROUSSEEUW_CROUX = new Reference("Rousseeuw & Croux, 1993",
            "Rousseeuw, P. J. & Croux, C. (1993). Alternatives to the median absolute deviation. Journal of the "
                    + "American Statistical Association, 88, 1273–1283.", "10.1080/01621459.1993.10476408");
    static final Reference GOMEZ = new Reference("Gómez et al., 1998",
            "Gómez, E., Gómez-Villegas, M. A. & Marín, J. M. (1998). A multivariate generalization of the power "
                    + "exponential family of distributions. Communications in Statistics - Theory and Methods, 27, "
                    + "589–600.", "10.1080/03610929808832115");
    /** Details from memory. */
    static final Reference WELCH = new Reference("Welch, 1947",
            "Welch, B. L. (1947). The generalization of 'Student's' problem when several different population "
                    + "variances are involved. Biometrika, 34, 28–35.", "10.1093/biomet/34.1-2.28");
    static final Reference WESTFALL_YOUNG = new Reference("Westfall & Young, 1993",
            "Westfall, P. H. & Young, S. S. (1993). Resampling-Based Multiple Testing: Examples and Methods for "
                    + "p-Value Adjustment. Wiley, New York. ISBN 978-0-471-55761-6.", "");
    static final Reference MULLNER = new Reference("Müllner, 2011",
            "Müllner, D. (2011). Modern hierarchical, agglomerative clustering algorithms. arXiv:1109.2378.",
            "10.48550/arXiv.1109.2378");
    static final Reference WARD = new Reference("Ward, 1963",
            "Ward, J. H. (1963). Hierarchical grouping to optimize an objective function. Journal of the American "
                    + "Statistical Association, 58, 236–244.", "10.1080/01621459.1963.10500845");
    static final Reference ANDERS_HUBER = new Reference("Anders & Huber, 2010",
            "Anders, S. & Huber, W. (2010). Differential expression analysis for sequence count data. Genome Biology, "
                    + "11, R106.", "10.1186/gb-2010-11-10-r106");
    static final Reference SIMS = new Reference("Sims et al., 2008",
            "Sims, A. H., Smethurst, G. J., Hey, Y., Okoniewski, M. J., Pepper, S. D., Howell, A., Miller, C. J. & "
                    + "Clarke, R. B. (2008). The removal of multiplicative, systematic bias allows integration of "
                    + "breast cancer gene expression datasets – improving meta-analysis and prediction of prognosis. "
                    + "BMC Medical Genomics, 1, 42.", "10.1186/1755-8794-1-42");
    static final Reference NYGAARD = new Reference("Nygaard et al., 2016",
            "Nygaard, V., Rødland, E. A. & Hovig, E. (2016). Methods that remove batch effects while retaining group "
                    + "differences may lead to exaggerated confidence in downstream analyses. Biostatistics, 17, "
                    + "29–39.", "10.1093/biostatistics/kxv027");
    static final Reference DILLIES = new Reference("Dillies et al., 2013",
            "Dillies, M.-A. et al. (2013). A comprehensive evaluation of normalization methods for Illumina "
                    + "high-throughput RNA sequencing data analysis. Briefings in Bioinformatics, 14, 671–683.",
            "10.1093/bib/bbs046");

    /**
     * The sources of the preparation steps a run took, in the order the steps ran: the library-size method's and,
     * after batch mean-centring, its own and that of its cost (cited in the methods text beside the step).
     */
    static java.util.List<Reference> ofPreparation(RunInfo run) {
        var out = new java.util.ArrayList<Reference>();
        switch (run.librarySize()) {
            case MEDIAN_RATIO -> out.add(ANDERS_HUBER);
            case TOTAL -> out.add(DILLIES);
            case NONE -> { }
        }
        if (run.centeredWithin() != null) {
            out.addAll(java.util.List.of(SIMS, NYGAARD));
        }
        return out;
    }
    static final Reference HARTIGAN = new Reference("Hartigan & Hartigan, 1985",
            "Hartigan, J. A. & Hartigan, P. M. (1985). The dip test of unimodality. The Annals of Statistics, 13, "
                    + "70–84.", "10.1214/aos/1176346577");
    static final Reference MURTAGH_LEGENDRE = new Reference("Murtagh & Legendre, 2014",
            "Murtagh, F. & Legendre, P. (2014). Ward's hierarchical agglomerative clustering method: which algorithms "
                    + "implement Ward's criterion? Journal of Classification, 31, 274–295.", "10.1007/s00357-014-9161-z");
}
