package org.tautline.app.ui.chart;

import java.util.Arrays;
import java.util.Optional;

/**
 * The lines of an FRF as a cursor reads them: frequency, magnitude and phase, and a per-line figure (coherence or the
 * sine fit's residual) when there is one. Immutable; free of Swing.
 *
 * @param frequencyHz line frequencies, increasing, Hz
 * @param magnitude |H| at each line, in {@code unit}
 * @param phaseDeg phase at each line, -180 to 180 degrees
 * @param unit the unit of |H| for people, for example "m/N"
 * @param lineFigure a per-line figure, empty when the FRF has none
 * @param lineFigureName what that figure is called, for example "coherence"
 */
public record FrfLines(double[] frequencyHz, double[] magnitude, double[] phaseDeg, String unit,
                       Optional<double[]> lineFigure, String lineFigureName) {

    /** Copies the arrays and checks that they have one value per line. */
    public FrfLines {
        frequencyHz = frequencyHz.clone();
        magnitude = magnitude.clone();
        phaseDeg = phaseDeg.clone();
        lineFigure = lineFigure.map(double[]::clone);
        int n = frequencyHz.length;
        if (magnitude.length != n || phaseDeg.length != n || lineFigure.map(f -> f.length != n).orElse(false)) {
            throw new IllegalArgumentException("an FRF needs one magnitude, one phase and one line figure per frequency;"
                    + " got " + n + " frequencies, " + magnitude.length + " magnitudes, " + phaseDeg.length + " phases");
        }
    }

    /** @return no lines */
    public static FrfLines none() {
        return new FrfLines(new double[0], new double[0], new double[0], "", Optional.empty(), "");
    }

    /** @return the number of lines */
    public int size() {
        return frequencyHz.length;
    }

    /**
     * @param hz a frequency, Hz
     * @return the index of the line nearest to it on a log scale; -1 when there are no lines
     */
    public int nearest(double hz) {
        int n = frequencyHz.length;
        if (n == 0) {
            return -1;
        }
        int i = Arrays.binarySearch(frequencyHz, hz);
        if (i >= 0) {
            return i;
        }
        int above = -i - 1;
        if (above == 0) {
            return 0;
        }
        if (above == n) {
            return n - 1;
        }
        return Math.log(hz / frequencyHz[above - 1]) <= Math.log(frequencyHz[above] / hz) ? above - 1 : above;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof FrfLines other && Arrays.equals(frequencyHz, other.frequencyHz)
                && Arrays.equals(magnitude, other.magnitude) && Arrays.equals(phaseDeg, other.phaseDeg)
                && unit.equals(other.unit) && lineFigureName.equals(other.lineFigureName)
                && lineFigure.isPresent() == other.lineFigure.isPresent()
                && (lineFigure.isEmpty() || Arrays.equals(lineFigure.get(), other.lineFigure.get()));
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(frequencyHz) + Arrays.hashCode(magnitude);
    }

    @Override
    public String toString() {
        return "FrfLines[" + size() + " lines, " + unit + "]";
    }
}
