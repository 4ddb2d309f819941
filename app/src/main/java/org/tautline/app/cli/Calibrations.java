package org.tautline.app.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.ChannelCalibration;
import org.tautline.analysis.frf.ChannelCalibration.Quantity;
import org.tautline.app.qualify.JsonFields;

/**
 * Channel calibrations from the command line ({@code CH=SENSITIVITY,UNIT}) or a small JSON file.
 *
 * <p>The JSON file (our own format) holds {@code {"channels": [{"channel": "force", "quantity":
 * "force", "sensitivityVoltsPerUnit": 0.0225, "unit": "N"}, ...]}}; {@code unit} may be left out,
 * it is then the quantity's SI unit.
 */
final class Calibrations {
    private Calibrations() {
    }

    /**
     * Parses one command-line calibration.
     *
     * @param text {@code CH=SENSITIVITY,UNIT}, for example {@code force=0.0225,N} or {@code 1=0.0102,m/s^2}
     * @return the calibration; the quantity follows from the SI unit
     */
    static ChannelCalibration parseOption(String text) {
        int equals = text.indexOf('=');
        int comma = text.lastIndexOf(',');
        if (equals <= 0 || comma < equals) {
            throw new AnalysisException("--sensitivity '" + text + "': expected CHANNEL=VOLTS_PER_UNIT,UNIT, for example"
                    + " force=0.0225,N or 1=0.0102,m/s^2");
        }
        String channel = text.substring(0, equals).strip();
        String number = text.substring(equals + 1, comma).strip();
        String unit = text.substring(comma + 1).strip();
        double sensitivity;
        try {
            sensitivity = Double.parseDouble(number);
        } catch (NumberFormatException e) {
            throw new AnalysisException("--sensitivity '" + text + "': '" + number + "' is not a number of volts per unit");
        }
        return new ChannelCalibration(channel, sensitivity, unit, quantityOfUnit(unit, "--sensitivity '" + text + "'"));
    }

    private static Quantity quantityOfUnit(String unit, String where) {
        for (Quantity q : Quantity.values()) {
            if (q.siUnit().equals(unit)) {
                return q;
            }
        }
        List<String> units = new ArrayList<>();
        for (Quantity q : Quantity.values()) {
            units.add(q.siUnit() + " (" + q.label() + ")");
        }
        throw new AnalysisException(where + ": unit '" + unit + "' is not one of " + String.join(", ", units));
    }

    /**
     * Reads a calibration file.
     *
     * @param file the JSON file
     * @return its calibrations, in file order
     * @throws IOException when the file cannot be read
     */
    static List<ChannelCalibration> readFile(Path file) throws IOException {
        List<ChannelCalibration> result = new ArrayList<>();
        for (JsonFields entry : JsonFields.read(file, "calibration").objects("channels")) {
            String channel = entry.textOrIndex("channel");
            double sensitivity = entry.number("sensitivityVoltsPerUnit");
            Quantity quantity;
            try {
                quantity = Quantity.of(entry.text("quantity"));
                String unit = entry.has("unit") ? entry.text("unit") : quantity.siUnit();
                result.add(new ChannelCalibration(channel, sensitivity, unit, quantity));
            } catch (AnalysisException e) {
                throw e.getMessage().startsWith(entry.where()) ? e
                        : new AnalysisException(entry.where() + ": " + e.getMessage(), e);
            }
        }
        return result;
    }
}
