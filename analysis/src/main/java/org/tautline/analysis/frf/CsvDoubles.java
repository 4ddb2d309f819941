package org.tautline.analysis.frf;

import java.util.Arrays;

/** A growable list of doubles, for reading columns of unknown length. */
final class CsvDoubles {
    private double[] values = new double[64];
    private int size;

    void add(double value) {
        if (size == values.length) {
            values = Arrays.copyOf(values, values.length * 2);
        }
        values[size++] = value;
    }

    int size() {
        return size;
    }

    double last() {
        return values[size - 1];
    }

    double[] toArray() {
        return Arrays.copyOf(values, size);
    }
}
