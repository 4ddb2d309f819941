package org.tautline.analysis.frf;

import java.util.Locale;

import org.tautline.analysis.AnalysisException;

/**
 * The calibration of one recorded channel: which channel, what it measures, and its sensitivity.
 *
 * <p>A calibrated channel's engineering value is its raw value divided by the sensitivity
 * (see {@link CalibratedSource}). Sensitivities are in volts per SI unit of the quantity (for
 * example 0.0225 V/N for a force sensor, 0.0102 V/(m/s^2) for an accelerometer), so the unit must
 * be the quantity's SI unit. A negative sensitivity is allowed: it stands for a sensor mounted or
 * wired the other way round.
 *
 * @param channel the channel's name or 0-based index in the recording, for example {@code force} or {@code 1}
 * @param sensitivityVoltsPerUnit raw units (volts) per unit of the quantity; finite and not zero
 * @param unit the quantity's SI unit, for example {@code N}
 * @param quantity what the channel measures
 */
public record ChannelCalibration(String channel, double sensitivityVoltsPerUnit, String unit, Quantity quantity) {

    /** What a channel measures, with its SI unit. */
    public enum Quantity {
        /** Force, N. */
        FORCE("N"),
        /** Displacement, m. */
        DISPLACEMENT("m"),
        /** Velocity, m/s. */
        VELOCITY("m/s"),
        /** Acceleration, m/s^2. */
        ACCELERATION("m/s^2"),
        /** Voltage, V (a sensitivity then is a gain, V/V). */
        VOLTAGE("V");

        private final String siUnit;

        Quantity(String siUnit) {
            this.siUnit = siUnit;
        }

        /** @return the SI unit, for example {@code m/s^2} */
        public String siUnit() {
            return siUnit;
        }

        /** @return the quantity in words, for messages: force, displacement, velocity, acceleration or voltage */
        public String label() {
            return switch (this) {
                case FORCE -> "force";
                case DISPLACEMENT -> "displacement";
                case VELOCITY -> "velocity";
                case ACCELERATION -> "acceleration";
                case VOLTAGE -> "voltage";
            };
        }

        /**
         * The quantity of a name.
         *
         * @param name force, displacement, velocity, acceleration or voltage (case-insensitive)
         * @return the quantity
         * @throws AnalysisException naming the quantities there are
         */
        public static Quantity of(String name) {
            for (Quantity quantity : values()) {
                if (name != null && quantity.name().equals(name.strip().toUpperCase(Locale.ROOT))) {
                    return quantity;
                }
            }
            throw new AnalysisException("channel quantity " + (name == null ? "is missing" : "'" + name + "' is unknown")
                    + "; expected force, displacement, velocity, acceleration or voltage");
        }
    }

    /**
     * Checks the calibration.
     *
     * @param channel the channel's name or 0-based index
     * @param sensitivityVoltsPerUnit volts per unit; finite and not zero
     * @param unit the quantity's SI unit
     * @param quantity what the channel measures
     * @throws AnalysisException if a part is missing, the sensitivity is zero or not finite, or the
     *                           unit is not the quantity's SI unit
     */
    public ChannelCalibration {
        if (channel == null || channel.isBlank()) {
            throw new AnalysisException("a channel calibration needs a channel name or 0-based index, got "
                    + (channel == null ? "none" : "'" + channel + "'"));
        }
        String where = "calibration of channel '" + channel + "': ";
        if (quantity == null) {
            throw new AnalysisException(where + "quantity is missing; expected force, displacement, velocity,"
                    + " acceleration or voltage");
        }
        if (!Double.isFinite(sensitivityVoltsPerUnit) || sensitivityVoltsPerUnit == 0) {
            throw new AnalysisException(where + "sensitivity " + sensitivityVoltsPerUnit + " V per " + quantity.siUnit()
                    + " must be finite and not zero");
        }
        if (unit == null || !unit.equals(quantity.siUnit())) {
            throw new AnalysisException(where + "unit " + (unit == null ? "is missing" : "'" + unit + "'")
                    + " does not match " + quantity.label() + "; expected '" + quantity.siUnit()
                    + "' (sensitivities are volts per SI unit)");
        }
    }

    /**
     * A calibration in the quantity's SI unit.
     *
     * @param channel the channel's name or 0-based index
     * @param sensitivityVoltsPerUnit volts per SI unit of the quantity
     * @param quantity what the channel measures
     * @return the calibration
     */
    public static ChannelCalibration of(String channel, double sensitivityVoltsPerUnit, Quantity quantity) {
        return new ChannelCalibration(channel, sensitivityVoltsPerUnit, quantity == null ? null : quantity.siUnit(),
                quantity);
    }
}
