package org.tautline.analysis.specimen;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.modal.FittedMode;

/**
 * Numbers fitted modes as harmonics of a stiff string, allowing for doublets and missing harmonics.
 *
 * <p>The numbering model is Fletcher's stiff string (H. Fletcher, J. Acoust. Soc. Am. 36:203, 1964):
 * f_n = n f0 sqrt(1 + B n^2), i.e. (f_n/n)^2 = f0^2 + f0^2 B n^2, a straight line in n^2. For clamped
 * ends the same form with a slightly higher f0 follows the exact roots closely enough to number them.
 * Modes closer than the split tolerance are first paired as the two polarisations of one harmonic
 * (a doublet, from a slightly anisotropic or non-round specimen: common practice). Then every
 * hypothesis "cluster i is harmonic n_i and cluster j is harmonic n_j" fixes a line (f0, B), as does
 * "cluster i is harmonic n_i" with the specimen's nominal B; each hypothesis numbers all clusters by
 * the nearest model harmonic within the harmonic tolerance (a fraction of f0), is refitted by weighted
 * least squares on all numbered clusters, and renumbered. Each hypothesis scores the number of modes
 * it numbers less the number of harmonics it leaves missing without a reason (in band, below its
 * highest numbered harmonic, with no node at the forcing point or sensor); the highest score wins,
 * then the fewest unexplained gaps, then the smallest residual. A subharmonic numbering (f0/2) can
 * absorb a stray rig mode, but only by leaving harmonics missing at no node, so it loses. Configured by
 * {@code withXxx} methods, each returning a new instance.
 */
public final class HarmonicAssigner {
    private static final int REFIT_PASSES = 4;
    private static final int ANCHOR_CLUSTERS = 5;
    private static final int PAIR_REACH = 8;

    private final double nodeThreshold;
    private final double splitTolerance;
    private final double harmonicTolerance;
    private final int maxHarmonic;
    private final double maxInharmonicity;
    private final double fundamentalTolerance;

    /** Defaults: node threshold 0.1, split 0.5 %, harmonic tolerance 0.05 f0, up to n = 60, B up to 0.05. */
    public HarmonicAssigner() {
        this(0.1, 0.005, 0.05, 60, 0.05, 0.2);
    }

    private HarmonicAssigner(double node, double split, double tol, int maxN, double maxB, double f1Tol) {
        this.nodeThreshold = node;
        this.splitTolerance = split;
        this.harmonicTolerance = tol;
        this.maxHarmonic = maxN;
        this.maxInharmonicity = maxB;
        this.fundamentalTolerance = f1Tol;
    }

    /**
     * Sets below which |sin(n pi x/L)| a point counts as a node.
     *
     * @param threshold 0..1, default 0.1
     * @return a new assigner
     */
    public HarmonicAssigner withNodeThreshold(double threshold) {
        require(threshold > 0 && threshold < 1, "node threshold must lie between 0 and 1, got " + threshold);
        return new HarmonicAssigner(threshold, splitTolerance, harmonicTolerance, maxHarmonic, maxInharmonicity,
                fundamentalTolerance);
    }

    /**
     * Sets the largest relative split (f2 - f1)/f1 of two modes taken as the polarisations of one harmonic.
     *
     * @param relativeSplit 0..0.1, default 0.005
     * @return a new assigner
     */
    public HarmonicAssigner withSplitTolerance(double relativeSplit) {
        require(relativeSplit >= 0 && relativeSplit < 0.1, "split tolerance must lie in 0..0.1, got " + relativeSplit);
        return new HarmonicAssigner(nodeThreshold, relativeSplit, harmonicTolerance, maxHarmonic, maxInharmonicity,
                fundamentalTolerance);
    }

    /**
     * Sets how far from the model harmonic a mode may be and still be numbered, as a fraction of f0.
     *
     * @param fractionOfF0 0..0.3, default 0.05
     * @return a new assigner
     */
    public HarmonicAssigner withHarmonicTolerance(double fractionOfF0) {
        require(fractionOfF0 > 0 && fractionOfF0 < 0.3, "harmonic tolerance must lie between 0 and 0.3 of f0, got "
                + fractionOfF0);
        return new HarmonicAssigner(nodeThreshold, splitTolerance, fractionOfF0, maxHarmonic, maxInharmonicity,
                fundamentalTolerance);
    }

    /**
     * Sets how far the numbering's first natural frequency may lie from the approximate one given to
     * {@link #assign}, relative (0.2 = within 20 %).
     *
     * @param relative 0..1, default 0.2
     * @return a new assigner
     */
    public HarmonicAssigner withFundamentalTolerance(double relative) {
        require(relative > 0 && relative < 1, "fundamental tolerance must lie between 0 and 1, got " + relative);
        return new HarmonicAssigner(nodeThreshold, splitTolerance, harmonicTolerance, maxHarmonic, maxInharmonicity,
                relative);
    }

    /**
     * Sets the highest harmonic number tried.
     *
     * @param highest 1..500, default 60
     * @return a new assigner
     */
    public HarmonicAssigner withMaxHarmonic(int highest) {
        require(highest >= 1 && highest <= 500, "highest harmonic must lie in 1..500, got " + highest);
        return new HarmonicAssigner(nodeThreshold, splitTolerance, harmonicTolerance, highest, maxInharmonicity,
                fundamentalTolerance);
    }

    /**
     * Numbers the modes.
     *
     * @param specimen the specimen (positions, nominal stiffness)
     * @param modes fitted modes, any order
     * @param approximateF1Hz approximate first natural frequency, Hz, or {@code NaN} when not known; the
     *     numbering's f1 is then kept within the fundamental tolerance (20 % unless set) of it
     * @param bandLowHz lowest frequency of the measured band, Hz
     * @param bandHighHz highest frequency of the measured band, Hz
     * @return the numbering and the absent harmonics
     */
    public HarmonicAssignment assign(Specimen specimen, List<FittedMode> modes, double approximateF1Hz,
                                     double bandLowHz, double bandHighHz) {
        require(bandLowHz >= 0 && bandHighHz > bandLowHz && !Double.isInfinite(bandHighHz),
                "band must satisfy 0 <= low < high, got " + bandLowHz + " .. " + bandHighHz + " Hz");
        require(Double.isNaN(approximateF1Hz) || approximateF1Hz > 0,
                "approximate f1 must be positive or NaN, got " + approximateF1Hz + " Hz");
        require(!modes.isEmpty(), "at least one fitted mode is needed to number harmonics, got none");
        List<ModeCluster> clusters = ModeCluster.group(modes, splitTolerance);
        double nominalB = specimen.bendingStiffnessNm2() > 0 ? StringPhysics.inharmonicity(
                specimen.bendingStiffnessNm2(), specimen.nominalTensionN(), specimen.lengthM()) : 0.0;
        Candidate best = null;
        for (double[] line : hypotheses(clusters, nominalB)) {
            Candidate c = evaluate(line[0], line[1], clusters, specimen, approximateF1Hz, bandLowHz, bandHighHz);
            if (c != null && (best == null || c.betterThan(best))) {
                best = c;
            }
        }
        if (best == null) {
            throw new AnalysisException(String.format(java.util.Locale.ROOT, "no harmonic series with f1 within %.0f %%"
                    + " of %.4g Hz and B up to %s fits the %d modes", 100 * fundamentalTolerance, approximateF1Hz,
                    maxInharmonicity, modes.size()));
        }
        return result(best, clusters, specimen, bandLowHz, bandHighHz);
    }

    private List<double[]> hypotheses(List<ModeCluster> clusters, double nominalB) {
        List<double[]> lines = new ArrayList<>();
        int k = clusters.size();
        for (int i = 0; i < Math.min(k, ANCHOR_CLUSTERS); i++) {
            double fi = clusters.get(i).frequencyHz();
            for (int ni = 1; ni <= maxHarmonic; ni++) {
                double f0 = fi / (ni * Math.sqrt(1 + nominalB * ni * ni));
                lines.add(new double[] {f0 * f0, f0 * f0 * nominalB});
                for (int j = i + 1; j < Math.min(k, i + 1 + PAIR_REACH); j++) {
                    double fj = clusters.get(j).frequencyHz();
                    int top = (int) Math.min(maxHarmonic, Math.floor(ni * fj / fi * (1 + 1e-9)));
                    for (int nj = ni + 1; nj <= top; nj++) {
                        double yi = fi * fi / ((double) ni * ni);
                        double yj = fj * fj / ((double) nj * nj);
                        double b = (yj - yi) / ((double) nj * nj - (double) ni * ni);
                        lines.add(new double[] {yi - b * ni * ni, b});
                    }
                }
            }
        }
        return lines;
    }

    private Candidate evaluate(double a, double b, List<ModeCluster> clusters, Specimen specimen, double approxF1,
                               double bandLow, double bandHigh) {
        int[] n = null;
        for (int pass = 0; pass < REFIT_PASSES; pass++) {
            if (!(a > 0) || b / a < -1e-4 || b / a > maxInharmonicity) {
                return null;
            }
            n = number(clusters, Math.sqrt(a), b / a);
            double[] refit = refit(clusters, n);
            if (refit == null || (Math.abs(refit[0] - a) <= 1e-12 * a && Math.abs(refit[1] - b) <= 1e-12 * a)) {
                break;
            }
            a = refit[0];
            b = refit[1];
        }
        if (!(a > 0) || b / a < -1e-4 || b / a > maxInharmonicity) {
            return null;
        }
        double f0 = Math.sqrt(a);
        double bb = b / a;
        n = number(clusters, f0, bb);
        if (!Double.isNaN(approxF1) && Math.abs(f0 * Math.sqrt(1 + bb) / approxF1 - 1) > fundamentalTolerance) {
            return null;
        }
        int assigned = 0;
        int highest = 0;
        double residual = 0;
        boolean[] present = new boolean[maxHarmonic + 1];
        for (int c = 0; c < n.length; c++) {
            if (n[c] > 0) {
                assigned += clusters.get(c).size();
                highest = Math.max(highest, n[c]);
                present[n[c]] = true;
                double r = (clusters.get(c).frequencyHz() - model(n[c], f0, bb)) / f0;
                residual += r * r;
            }
        }
        int unexplained = 0;
        for (int h = 1; h < highest; h++) {
            double fh = model(h, f0, bb);
            if (!present[h] && fh >= bandLow && fh <= bandHigh && Math.abs(specimen.forcingShape(h)) >= nodeThreshold
                    && Math.abs(specimen.sensorShape(h)) >= nodeThreshold) {
                unexplained++;
            }
        }
        return new Candidate(f0, bb, n, assigned, unexplained, residual);
    }

    private int[] number(List<ModeCluster> clusters, double f0, double b) {
        int[] n = new int[clusters.size()];
        double[] miss = new double[clusters.size()];
        for (int c = 0; c < n.length; c++) {
            double f = clusters.get(c).frequencyHz();
            double r = f / f0;
            double disc = 1 + 4 * b * r * r;
            double continuous = Math.abs(b) < 1e-12 || disc < 0 ? r : Math.sqrt((Math.sqrt(disc) - 1) / (2 * b));
            int h = (int) Math.round(continuous);
            if (h >= 1 && h <= maxHarmonic && Math.abs(f - model(h, f0, b)) <= harmonicTolerance * f0) {
                n[c] = h;
                miss[c] = Math.abs(f - model(h, f0, b));
            }
        }
        for (int c = 0; c < n.length; c++) {
            for (int d = c + 1; d < n.length; d++) {
                if (n[c] > 0 && n[c] == n[d]) {
                    if (miss[c] <= miss[d]) {
                        n[d] = 0;
                    } else {
                        n[c] = 0;
                    }
                }
            }
        }
        return n;
    }

    private static double[] refit(List<ModeCluster> clusters, int[] n) {
        int count = (int) Arrays.stream(n).filter(h -> h > 0).count();
        if (count < 2) {
            return null;
        }
        double[] x = new double[count];
        double[] y = new double[count];
        double[] s = new double[count];
        int k = 0;
        for (int c = 0; c < n.length; c++) {
            if (n[c] > 0) {
                double f = clusters.get(c).frequencyHz();
                x[k] = (double) n[c] * n[c];
                y[k] = f * f / x[k];
                s[k] = 2 * f * clusters.get(c).frequencyStdHz() / x[k];
                k++;
            }
        }
        WeightedLine line = WeightedLine.fit(x, y, s);
        return new double[] {line.intercept(), line.slope()};
    }

    static double model(int n, double f0, double b) {
        return n * f0 * Math.sqrt(1 + b * n * n);
    }

    private HarmonicAssignment result(Candidate best, List<ModeCluster> clusters, Specimen specimen, double bandLow,
                                      double bandHigh) {
        List<AssignedMode> assigned = new ArrayList<>();
        List<Integer> unnumbered = new ArrayList<>();
        boolean[] present = new boolean[maxHarmonic + 1];
        for (int c = 0; c < clusters.size(); c++) {
            ModeCluster cluster = clusters.get(c);
            for (int p = 0; p < cluster.size(); p++) {
                if (best.numbers[c] > 0) {
                    int polarisation = cluster.size() == 1 ? 0 : p + 1;
                    assigned.add(new AssignedMode(cluster.modeIndex(p), cluster.frequencyHz(p), best.numbers[c],
                            polarisation));
                    present[best.numbers[c]] = true;
                } else {
                    unnumbered.add(cluster.modeIndex(p));
                }
            }
        }
        assigned.sort(Comparator.comparingDouble(AssignedMode::frequencyHz));
        List<AbsentHarmonic> absent = new ArrayList<>();
        for (int h = 1; h <= maxHarmonic && model(h, best.f0, best.b) <= bandHigh; h++) {
            if (!present[h]) {
                absent.add(absence(h, model(h, best.f0, best.b), specimen, bandLow, bandHigh));
            }
        }
        return new HarmonicAssignment(assigned, unnumbered, absent, best.f0, best.b);
    }

    private AbsentHarmonic absence(int h, double fh, Specimen specimen, double bandLow, double bandHigh) {
        double sf = specimen.forcingShape(h);
        double ss = specimen.sensorShape(h);
        if (fh < bandLow || fh > bandHigh) {
            return new AbsentHarmonic(h, fh, AbsenceReason.OUTSIDE_BAND, String.format(Locale.ROOT,
                    "outside the band (expected at %.3f Hz, the band is %.3f to %.3f Hz)", fh, bandLow, bandHigh));
        }
        if (Math.abs(sf) < nodeThreshold) {
            return new AbsentHarmonic(h, fh, AbsenceReason.NODE_AT_FORCING_POINT, String.format(Locale.ROOT,
                    "the stinger is at a node of this mode (the mode shape there is %.3f of its largest)",
                    Math.abs(sf)));
        }
        if (Math.abs(ss) < nodeThreshold) {
            return new AbsentHarmonic(h, fh, AbsenceReason.NODE_AT_SENSOR, String.format(Locale.ROOT,
                    "the sensor is at a node of this mode (the mode shape there is %.3f of its largest)",
                    Math.abs(ss)));
        }
        return new AbsentHarmonic(h, fh, AbsenceReason.BELOW_NOISE, String.format(Locale.ROOT,
                "below the noise, with neither the stinger nor the sensor at a node (the mode shapes there multiply"
                        + " to %.3f of their largest)", Math.abs(sf * ss)));
    }

    private static void require(boolean condition, String message) {
        if (!condition) {
            throw new AnalysisException(message);
        }
    }

    private record Candidate(double f0, double b, int[] numbers, int assigned, int unexplained, double residual) {
        boolean betterThan(Candidate other) {
            int score = assigned - unexplained;
            int otherScore = other.assigned - other.unexplained;
            if (score != otherScore) {
                return score > otherScore;
            }
            if (unexplained != other.unexplained) {
                return unexplained < other.unexplained;
            }
            return residual < other.residual * (1 - 1e-9);
        }
    }
}
