package org.tautline.analysis.frf;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;

/** {@link Frf#withinBand}: the lines of a band, both edges included, with what each line carries. */
class FrfBandTest {
    private static Frf frf() {
        double[] f = {10, 20, 30, 40, 50};
        return Frf.of(f, new double[] {1, 2, 3, 4, 5}, new double[] {-1, -2, -3, -4, -5}, FrfQuantity.MOBILITY)
                .withVariance(new double[] {0.1, 0.2, 0.3, 0.4, 0.5})
                .withCoherence(new double[] {0.9, 0.8, 0.7, 0.6, 0.5});
    }

    @Test
    void keepsTheLinesOfTheBandWithTheirVarianceAndCoherence() {
        Frf band = frf().withinBand(20, 40);
        assertArrayEquals(new double[] {20, 30, 40}, band.frequenciesHz());
        assertArrayEquals(new double[] {2, 3, 4}, band.realParts());
        assertArrayEquals(new double[] {-2, -3, -4}, band.imaginaryParts());
        assertArrayEquals(new double[] {0.2, 0.3, 0.4}, band.variance().orElseThrow());
        assertArrayEquals(new double[] {0.8, 0.7, 0.6}, band.coherence().orElseThrow());
        assertEquals(FrfQuantity.MOBILITY, band.quantity());
    }

    @Test
    void aBandBetweenTwoLinesIsRefusedNamingIt() {
        AnalysisException e = assertThrows(AnalysisException.class, () -> frf().withinBand(21, 29));
        assertTrue(e.getMessage().contains("21.0 to 29.0 Hz"), e.getMessage());
    }
}
