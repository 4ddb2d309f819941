package org.tautline.app.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.analysis.modal.Mode;

/**
 * The named, seeded cases of the modal benchmark suite (invented data).
 *
 * <p>Together they cover: polarisation doublets split by 0.5, 1, 2 and 5 half-power bandwidths at damping ratios
 * 0.01, 0.001 and 0.0001 (uniform 4000-line grids for the first two, stepped-sine lines dense around each peak for
 * the last, which no uniform grid of that size resolves); weak modes 5, 7 and 10 noise standard deviations above
 * the floor; 24 modes fitted between strong modes below and above the band, on a band-limited measurement and as a
 * sub-band of a wider one; receptance, mobility and accelerance. Every case is made from its own fixed seed, so the
 * same suite is built every time. The weak-mode and out-of-band cases are in {@link ModalCaseSuiteMore}.
 */
public final class ModalCaseSuite {
    /** Splits of the doublet cases, in half-power bandwidths. */
    static final double[] SPLITS_BANDWIDTHS = {0.5, 1, 2, 5};
    /** Damping ratios of the doublet cases. */
    static final double[] DAMPING_RATIOS = {1e-2, 1e-3, 1e-4};
    /** Lines of every uniform grid. */
    static final int UNIFORM_LINES = 4000;
    /** Peak of the weakest mode over the noise in the doublet cases, dB. */
    static final double DOUBLET_PEAK_TO_NOISE_DB = 40;
    private static final long DOUBLET_SEED = 1400;
    private static final int DOUBLET_HARMONICS = 4;

    private ModalCaseSuite() {
    }

    /** @return every case of the suite, in a fixed order */
    public static List<ModalCase> all() {
        List<ModalCase> cases = new ArrayList<>();
        FrfQuantity[] quantities = FrfQuantity.values();
        int i = 0;
        for (double zeta : DAMPING_RATIOS) {
            for (double split : SPLITS_BANDWIDTHS) {
                cases.add(doublets(DOUBLET_SEED + i, zeta, split, quantities[i % quantities.length]));
                i++;
            }
        }
        cases.add(ModalCaseSuiteMore.weakFourthHarmonic());
        cases.add(ModalCaseSuiteMore.weakThirdAndFifthHarmonics());
        cases.add(ModalCaseSuiteMore.betweenStrongModesOutsideTheBand());
        cases.add(ModalCaseSuiteMore.subBandOfALongerString());
        return List.copyOf(cases);
    }

    /**
     * Four harmonics, each as two polarisations split by the given number of half-power bandwidths.
     *
     * @param seed the case's seed
     * @param zeta damping ratio of each lower mode (the upper one within 10 %)
     * @param splitBandwidths (f_upper - f_lower)/(2 zeta f_lower)
     * @param quantity the FRF's quantity
     * @return the case
     */
    static ModalCase doublets(long seed, double zeta, double splitBandwidths, FrfQuantity quantity) {
        ModalCaseBuilder b = new ModalCaseBuilder(seed);
        b.string(b.uniform(100, 160), b.logUniform(1e-4, 5e-4));
        b.drawPositions(new double[] {0.07, 0.17}, new double[] {0.55, 0.75}, 1, DOUBLET_HARMONICS, 0.35);
        List<double[]> regions = new ArrayList<>();
        double[] bandwidths = new double[DOUBLET_HARMONICS];
        for (int n = 1; n <= DOUBLET_HARMONICS; n++) {
            double angle = b.uniform(25, 45);
            List<Mode> pair = b.doublet(n, zeta, splitBandwidths, b.coin() ? angle : 90 - angle, b.uniform(0.9, 1.1));
            regions.add(new double[] {pair.get(0).frequencyHz(), pair.get(1).frequencyHz()});
            bandwidths[n - 1] = 2 * zeta * pair.get(0).frequencyHz();
        }
        List<Mode> modes = b.modes();
        double lowHz = 0.8 * modes.get(0).frequencyHz();
        double top = modes.get(modes.size() - 1).frequencyHz();
        double highHz = top * (1 + Math.max(0.05, 16 * zeta));
        ModalCaseGrid grid = zeta >= 1e-3 ? ModalCaseGrid.uniform(lowHz, highHz, UNIFORM_LINES)
                : ModalCaseGrid.steppedAroundPeaks(lowHz, highHz, 400, regions, bandwidths, 8, 8);
        double s = ModalCaseBuilder.noiseBelowWeakest(modes, quantity, DOUBLET_PEAK_TO_NOISE_DB);
        Frf frf = b.frf(grid, quantity, s);
        String name = String.format(Locale.ROOT, "doublets %s half-power bandwidth%s apart, damping ratio %s",
                number(splitBandwidths), splitBandwidths == 1 ? "" : "s", number(zeta));
        String description = String.format(Locale.ROOT, "%d harmonics, each as two polarisations (planes 25-45 degrees"
                        + " from the force, the upper mode's damping within 10 %% of the lower's) split by %s half-power"
                        + " bandwidth%s, damping ratio %s; %s; %s, %.1f lines in the first mode's half-power band; noise"
                        + " %.0f dB below the weakest peak; %s", DOUBLET_HARMONICS, number(splitBandwidths),
                splitBandwidths == 1 ? "" : "s", number(zeta),
                quantity.label(), grid.description(), bandwidths[0] / grid.spacingAtHz(regions.get(0)[0]),
                DOUBLET_PEAK_TO_NOISE_DB, b.stringWords());
        return new ModalCase(name, description, seed, modes, frf, grid, s, grid.frequencyHz()[0],
                grid.frequencyHz()[grid.size() - 1], false, ModalCase.Claim.doublets(zeta, splitBandwidths));
    }

    /** @return 0.5, 1, 0.01, 0.0001 written plainly */
    static String number(double x) {
        return java.math.BigDecimal.valueOf(x).stripTrailingZeros().toPlainString();
    }
}
