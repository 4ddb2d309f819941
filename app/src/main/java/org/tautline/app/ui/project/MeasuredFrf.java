package org.tautline.app.ui.project;

import java.util.Arrays;
import java.util.List;

import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;

/**
 * The measured FRF as stored in a project file: complex values at each line.
 *
 * @param quantity receptance, mobility or accelerance
 * @param frequencyHz line frequencies, Hz
 * @param real real parts, in the quantity's unit
 * @param imag imaginary parts
 */
public record MeasuredFrf(FrfQuantity quantity, List<Double> frequencyHz, List<Double> real, List<Double> imag) {

    /** Copies the lists and checks that they have one value per line. */
    public MeasuredFrf {
        frequencyHz = List.copyOf(frequencyHz);
        real = List.copyOf(real);
        imag = List.copyOf(imag);
        if (real.size() != frequencyHz.size() || imag.size() != frequencyHz.size()) {
            throw new IllegalArgumentException("measured FRF: frequencyHz has " + frequencyHz.size() + " lines but real has "
                    + real.size() + " and imag " + imag.size() + "; expected one value per line");
        }
    }

    /**
     * @param frf an FRF
     * @return its values
     */
    public static MeasuredFrf of(Frf frf) {
        return new MeasuredFrf(frf.quantity(), boxed(frf.frequenciesHz()), boxed(frf.realParts()), boxed(frf.imaginaryParts()));
    }

    /** @return the FRF these values describe */
    public Frf toFrf() {
        return Frf.of(unboxed(frequencyHz), unboxed(real), unboxed(imag), quantity);
    }

    private static List<Double> boxed(double[] values) {
        return Arrays.stream(values).boxed().toList();
    }

    private static double[] unboxed(List<Double> values) {
        return values.stream().mapToDouble(Double::doubleValue).toArray();
    }
}
