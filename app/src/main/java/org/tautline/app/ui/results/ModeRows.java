package org.tautline.app.ui.results;

import java.util.ArrayList;
import java.util.List;

import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.qualify.QualifiedMode;
import org.tautline.app.qualify.QualificationResult;

/**
 * The rows of the mode table: one per fitted mode, in frequency order, values with their standard uncertainties
 * rounded together ({@link PropertyLines#shown}). Free of Swing.
 */
final class ModeRows {
    /** Column titles. */
    static final List<String> COLUMNS = List.of("Harmonic n", "Polarisation", "Natural frequency (Hz)",
            "Damping ratio", "Modal constant (1/kg)");

    private ModeRows() {
    }

    /**
     * One table row.
     *
     * @param harmonic harmonic number, or "none" for a mode outside the series
     * @param polarisation "single", "lower" or "upper"
     * @param frequency natural frequency ± its standard uncertainty, rounded as the GUM asks
     * @param damping damping ratio ± its standard uncertainty
     * @param modalConstant real part ± its standard uncertainty, and the imaginary part when it is not negligible
     */
    record Row(String harmonic, String polarisation, String frequency, String damping, String modalConstant) {
        String cell(int column) {
            return switch (column) {
                case 0 -> harmonic;
                case 1 -> polarisation;
                case 2 -> frequency;
                case 3 -> damping;
                case 4 -> modalConstant;
                default -> throw new IndexOutOfBoundsException("the mode table has " + COLUMNS.size()
                        + " columns, asked for column " + column);
            };
        }
    }

    /**
     * @param result a qualification
     * @return its rows
     */
    static List<Row> of(QualificationResult result) {
        List<Row> rows = new ArrayList<>();
        for (QualifiedMode m : result.modes()) {
            rows.add(rowOf(m));
        }
        return rows;
    }

    static Row rowOf(QualifiedMode m) {
        FittedMode f = m.fitted();
        String harmonic = m.harmonic() > 0 ? Integer.toString(m.harmonic()) : "not in the series";
        String polarisation = switch (m.polarisation()) {
            case 1 -> "lower of a pair";
            case 2 -> "upper of a pair";
            default -> "single";
        };
        double re = f.mode().modalConstant().getReal();
        double im = f.mode().modalConstant().getImaginary();
        String constant = PropertyLines.shown(re, f.modalConstantStd().getReal(), "");
        if (Math.abs(im) > 1e-6 * Math.abs(re)) {
            constant += " + j (" + PropertyLines.shown(im, f.modalConstantStd().getImaginary(), "") + ")";
        }
        return new Row(harmonic, polarisation, PropertyLines.shown(f.mode().frequencyHz(), f.frequencyStdHz(), ""),
                PropertyLines.shown(f.mode().dampingRatio(), f.dampingRatioStd(), ""), constant);
    }
}
