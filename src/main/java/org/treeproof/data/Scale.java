package org.treeproof.data;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;

/**
 * How features are put on a common scale before distances are computed; always per feature, over the samples.
 * Means and standard deviations are population ones (divisor n), as numpy computes them by default.
 */
public enum Scale {
    /** The values as they are (after any log2). */
    NONE("Left the features on their own scales (no scaling).", "none") {
        @Override
        void apply(PreparationRun run) {
        }
    },
    /** Subtract each feature's mean. */
    CENTER("Centred every feature at mean 0.", "center", "centre") {
        @Override
        void apply(PreparationRun run) {
            double[] mean = run.table.means();
            double[] one = new double[mean.length];
            Arrays.fill(one, 1.0);
            run.table.shiftAndDivide(mean, one);
            run.refuseNonFinite("centring");
        }
    },
    /**
     * Subtract each feature's mean and divide by its population standard deviation. A constant feature has no
     * z-score; it is dropped and reported instead of being divided by zero.
     */
    ZSCORE("Scaled every feature to mean 0 and population standard deviation 1 (z-scores).", "zscore", "z-score", "standardize", "standardise") {
        @Override
        void apply(PreparationRun run) {
            dropConstantFeatures(run, this);
            // z-scores do not change when a feature is scaled, so each is first divided by a power of two near its
            // largest magnitude (exactly): then neither the squares of 1e308 overflow nor those of 1e-310 underflow,
            // and ordinary values give the same bits as without it.
            run.table.scaleByPowerOfTwo(run.table.powerOfTwoExponents(), -1);
            double[] mean = run.table.means();
            double[] sd = run.table.variances(mean);
            for (int j = 0; j < sd.length; j++) {
                sd[j] = Math.sqrt(sd[j]);
            }
            run.table.shiftAndDivide(mean, sd);
        }
    },
    /**
     * Subtract each feature's median and divide by its Q<sub>n</sub> scale (see {@link QnScale}; Rousseeuw and
     * Croux 1993, doi:10.1080/01621459.1993.10476408). At a normal feature Qn equals the SD, so noise features
     * are scaled as by {@link #ZSCORE}; but Qn is read within a mode, so a feature whose values fall in separated
     * groups keeps its separation, where dividing by the SD shrinks it by the between-group spread (the problem
     * of standardising by the total SD that G. W. Milligan and M. C. Cooper, "A study of standardization of
     * variables in cluster analysis", J. Classification 5 (1988) 181-204, doi:10.1007/BF01897163, describe). A
     * feature whose Qn is 0 (at least about a quarter of the sample pairs tie, e.g. a binary or mostly-zero
     * feature) is divided by its population SD instead. Constant features are dropped, as for z-scores.
     *
     * <p>Not the default: Qn also reads the spread of a skewed feature's dense core, so a long tail is magnified.
     * Tried as the default on the judgement suite (draw 0) and the unseen sets (3 December 2026), it found
     * groups missed under z-scores (three groups in t4 noise; groups on two of ten features beside a batch) but
     * made two false claims on noise (skewed features; zero-inflated abundances) and lost two supported sets (a
     * group of 30 of 300 in t3 noise; two groups in 30 of 1000 features): see {@code bench/judgement/README.md}.
     * Long-tailed features need {@code --log2} first.
     */
    ROBUST("Centred every feature at its median and divided it by its Qn scale (Rousseeuw and Croux 1993; by its"
            + " standard deviation where Qn is 0).", "robust", "qn") {
        @Override
        void apply(PreparationRun run) {
            dropConstantFeatures(run, this);
            run.table.scaleByPowerOfTwo(run.table.powerOfTwoExponents(), -1);
            int p = run.table.features();
            double[] median = new double[p];
            double[] divisor = new double[p];
            double[] mean = null;
            double[] variance = null;
            for (int j = 0; j < p; j++) {
                double[] x = run.table.column(j);
                double qn = QnScale.of(x);
                median[j] = MissingPolicy.medianOfObserved(x);   // no cell is missing after the missing-value step
                if (qn > 0) {
                    divisor[j] = qn;
                } else {
                    if (variance == null) {
                        mean = run.table.means();
                        variance = run.table.variances(mean);
                    }
                    divisor[j] = Math.sqrt(variance[j]);
                }
            }
            run.table.shiftAndDivide(median, divisor);
        }
    };

    private final String sentence;
    private final String userName;
    private final String[] aliases;

    Scale(String sentence, String userName, String... aliases) {
        this.sentence = sentence;
        this.userName = userName;
        this.aliases = aliases;
    }

    /** What this scaling did, as a sentence for reports. */
    public String sentence() {
        return sentence;
    }

    /** The name users type, e.g. {@code zscore}. */
    public String userName() {
        return userName;
    }

    /**
     * The scaling for a user-typed name or alias ({@code centre}, {@code z-score}, {@code standardize}), ignoring
     * case.
     *
     * @throws InputException naming the accepted names when {@code name} is none of them
     */
    public static Scale fromUserName(String name) {
        String key = name.strip().toLowerCase(Locale.ROOT);
        for (Scale s : values()) {
            if (s.userName.equals(key) || Arrays.asList(s.aliases).contains(key)) {
                return s;
            }
        }
        throw new InputException("unknown scaling '" + name + "'; use one of " + names());
    }

    /** The user names, comma-separated, for help and messages. */
    public static String names() {
        return Arrays.stream(values()).map(Scale::userName).collect(Collectors.joining(", "));
    }

    abstract void apply(PreparationRun run);

    /**
     * Drops and reports the constant features, which have no spread to divide by; refuses a table whose every
     * feature is constant, naming {@code scale}.
     */
    private static void dropConstantFeatures(PreparationRun run, Scale scale) {
        boolean[] constant = run.table.constantFeatures();
        int left = 0;
        for (boolean c : constant) {
            left += c ? 0 : 1;
        }
        if (left == 0) {
            throw new InputException(run.where.source() + ": all " + run.table.samples() + " samples are "
                    + "identical: every feature is constant across the samples, so --scale " + scale.userName()
                    + " leaves nothing to cluster");
        }
        run.dropFeatures(constant, PreparationReport.Reason.CONSTANT, new int[constant.length]);
    }

    @Override
    public String toString() {
        return userName;
    }
}
