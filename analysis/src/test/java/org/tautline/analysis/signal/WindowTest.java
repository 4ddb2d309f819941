package org.tautline.analysis.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;

class WindowTest {
    private static final int N = 4096;

    /** Figures of one periodic window at N = 4096, each compared to the printed digits. */
    private static void assertFigures(WindowType type, double enbw, double scallopDb, double sidelobeDb, double gain,
                                      String source) {
        Window w = Window.of(type, N, true);
        assertEquals(enbw, w.enbwBins(), 0.0005, type + " ENBW, bins (" + source + ")");
        assertEquals(scallopDb, w.scallopLossDb(), 0.005, type + " scalloping loss, dB (" + source + ")");
        assertEquals(sidelobeDb, w.highestSidelobeDb(), 0.05, type + " highest sidelobe, dB (" + source + ")");
        assertEquals(gain, w.coherentGain(), 0.0005, type + " coherent gain (" + source + ")");
    }

    @Test
    void hannMatchesHarris1978() {
        // Harris, Proc. IEEE 66(1):51-83, 1978, table 1 (from memory), as computed in checks.md
        assertFigures(WindowType.HANN, 1.500, 1.42, -31.5, 0.500, "Harris 1978, table 1");
    }

    @Test
    void hammingMatchesThe054Coefficients() {
        // checks.md: 0.54/0.46 Hamming gives 1.75 dB scalloping (Harris prints 1.78 dB for the 25/46 form)
        assertFigures(WindowType.HAMMING, 1.363, 1.75, -42.7, 0.540, "Harris 1978 / checks.md for 0.54/0.46");
    }

    @Test
    void blackmanHarris4MatchesHarris1978() {
        assertFigures(WindowType.BLACKMAN_HARRIS_4, 2.004, 0.83, -92.0, 0.359, "Harris 1978, 4-term -92 dB");
    }

    @Test
    void blackmanHarris3MatchesNuttallsCorrectionOfHarris() {
        // Harris prints -67 dB; the 3-term window's sidelobe is -70.8 dB (Nuttall 1981, checks.md)
        assertFigures(WindowType.BLACKMAN_HARRIS_3, 1.709, 1.13, -70.8, 0.423, "Harris 1978 corrected by Nuttall 1981");
    }

    @Test
    void flatTopHft95MatchesHeinzel2002() {
        // Heinzel, Ruediger & Schilling 2002, HFT95 entry (checks.md): ENBW 3.811 bins, scalloping 0.004 dB;
        // highest sidelobe -95.0 dB from the same entry, from memory
        Window w = Window.of(WindowType.FLAT_TOP_HFT95, N, true);
        assertEquals(3.811, w.enbwBins(), 0.0005, "HFT95 ENBW, bins (Heinzel et al. 2002)");
        assertEquals(0.004, w.scallopLossDb(), 0.0005, "HFT95 scalloping, dB (Heinzel et al. 2002)");
        assertEquals(-95.0, w.highestSidelobeDb(), 0.1, "HFT95 highest sidelobe, dB (Heinzel et al. 2002, from memory)");
    }

    @Test
    void rectangularSidelobeIsTheDirichletKernels() {
        // Harris 1978, table 1: rectangular window, highest sidelobe -13.3 dB, scalloping 3.92 dB, ENBW 1
        Window w = Window.of(WindowType.RECTANGULAR, N, true);
        assertEquals(1.0, w.enbwBins(), 1e-12, "rectangular ENBW (Harris 1978)");
        assertEquals(3.92, w.scallopLossDb(), 0.005, "rectangular scalloping (Harris 1978)");
        assertEquals(-13.3, w.highestSidelobeDb(), 0.05, "rectangular highest sidelobe (Harris 1978)");
    }

    @Test
    void periodicAndSymmetricFormsFollowTheirDefinitions() {
        // Harris 1978, section on DFT-even windows: periodic w[n] uses 2 pi n / N, symmetric 2 pi n / (N - 1)
        int n = 9;
        double[] periodic = Window.of(WindowType.HANN, n, true).values();
        double[] symmetric = Window.of(WindowType.HANN, n, false).values();
        for (int i = 0; i < n; i++) {
            assertEquals(0.5 - 0.5 * Math.cos(2 * Math.PI * i / n), periodic[i], 1e-15, "periodic Hann sample " + i);
            assertEquals(0.5 - 0.5 * Math.cos(2 * Math.PI * i / (n - 1)), symmetric[i], 1e-15, "symmetric Hann sample " + i);
            assertEquals(symmetric[i], symmetric[n - 1 - i], 1e-15, "symmetric Hann is even about its middle");
        }
        // the periodic window of length N is the symmetric window of length N + 1 without its last sample
        double[] longer = Window.of(WindowType.BLACKMAN_HARRIS_4, n + 1, false).values();
        double[] bh4 = Window.of(WindowType.BLACKMAN_HARRIS_4, n, true).values();
        for (int i = 0; i < n; i++) {
            assertEquals(longer[i], bh4[i], 1e-15, "periodic BH4 = symmetric BH4 of N + 1, sample " + i);
        }
        assertEquals(0.0, periodic[0], 1e-15, "periodic Hann starts at zero");
        assertEquals(1.0, symmetric[n / 2], 1e-15, "odd symmetric Hann peaks at 1 in the middle");
    }

    @Test
    void valuesAreACopy() {
        Window w = Window.of(WindowType.HANN, 8, true);
        double[] v = w.values();
        v[3] = 99;
        assertEquals(0.5 - 0.5 * Math.cos(2 * Math.PI * 3 / 8), w.values()[3], 1e-15, "the window is not changed through values()");
    }

    @Test
    void rejectsShortWindowsAndMissingType() {
        AnalysisException shortOne = assertThrows(AnalysisException.class, () -> Window.of(WindowType.HANN, 1, true));
        assertEquals("window length must be at least 2 samples, got 1", shortOne.getMessage());
        AnalysisException missing = assertThrows(AnalysisException.class, () -> Window.of(null, 16, true));
        assertEquals("window type is missing: expected one of [RECTANGULAR, HANN, HAMMING, BLACKMAN_HARRIS_3,"
                + " BLACKMAN_HARRIS_4, FLAT_TOP_HFT95]", missing.getMessage());
    }
}
