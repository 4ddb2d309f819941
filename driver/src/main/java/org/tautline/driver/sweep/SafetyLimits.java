package org.tautline.driver.sweep;

import java.util.Locale;
import java.util.Optional;

import org.tautline.driver.RigException;

/**
 * The limits that stop a sweep: the drive ceiling and three measured peaks checked on every block.
 *
 * <p>The drive voltage is commanded, not measured: the level control never commands more than
 * {@code driveV}, and a plan whose drive level is above it is refused before any excitation. The
 * force, the response and the specimen displacement are measured: the largest absolute sample of
 * each block is compared with its limit, so a limit trips within the block in which it is reached.
 * The displacement is the response converted to displacement at the drive frequency
 * (acceleration / w^2, velocity / w), which is exact for the fundamental of a steady sine.
 *
 * @param driveV highest peak drive voltage ever commanded, V
 * @param forceN highest peak force, N
 * @param responseAmplitude highest peak response, in the response channel's unit (m, m/s or m/s^2)
 * @param displacementM highest peak displacement at the response sensor, m
 */
public record SafetyLimits(double driveV, double forceN, double responseAmplitude, double displacementM) {

    /** Checks that every limit is a positive number. */
    public SafetyLimits {
        positive("limits.driveV", driveV, "V");
        positive("limits.forceN", forceN, "N");
        positive("limits.responseAmplitude", responseAmplitude, "response unit");
        positive("limits.displacementM", displacementM, "m");
    }

    private static void positive(String field, double value, String unit) {
        if (!(value > 0) || Double.isNaN(value)) {
            throw new RigException("sweep plan: " + field + " must be a positive number of " + unit + ", got " + value);
        }
    }

    /**
     * Checks one block of samples against the measured limits.
     *
     * @param samples samples[0] force (N), samples[1] response
     * @param responseQuantity displacement, velocity or acceleration
     * @param frequencyHz drive frequency, Hz
     * @return the reason when a limit is reached, empty otherwise
     */
    public Optional<String> check(double[][] samples, String responseQuantity, double frequencyHz) {
        double forcePeak = peak(samples[0]);
        if (!(forcePeak < forceN)) {
            return Optional.of(reason("force", forcePeak, forceN, "N", frequencyHz));
        }
        double responsePeak = peak(samples[1]);
        if (!(responsePeak < responseAmplitude)) {
            return Optional.of(reason("response", responsePeak, responseAmplitude, unitOf(responseQuantity), frequencyHz));
        }
        double w = 2 * Math.PI * frequencyHz;
        double displacement = switch (responseQuantity) {
            case "acceleration" -> responsePeak / (w * w);
            case "velocity" -> responsePeak / w;
            default -> responsePeak;
        };
        if (!(displacement < displacementM)) {
            return Optional.of(reason("specimen displacement", displacement, displacementM, "m", frequencyHz));
        }
        return Optional.empty();
    }

    private static String unitOf(String responseQuantity) {
        return switch (responseQuantity) {
            case "acceleration" -> "m/s^2";
            case "velocity" -> "m/s";
            default -> "m";
        };
    }

    /** @return the limits in words, for reports and file headers */
    public String describe() {
        return String.format(Locale.ROOT, "drive %.4g V, force %.4g N, response %s, displacement %.4g m", driveV, forceN,
                Double.isInfinite(responseAmplitude) ? "not limited beyond the displacement"
                        : String.format(Locale.ROOT, "%.4g (sensor units)", responseAmplitude), displacementM);
    }

    private static String reason(String what, double value, double limit, String unit, double f) {
        return String.format(Locale.ROOT, "safety limit reached: %s peak %.4g %s at %.2f Hz is at or above the limit %.4g %s",
                what, value, unit, f, limit, unit);
    }

    private static double peak(double[] x) {
        double m = 0;
        for (double v : x) {
            double a = Math.abs(v);
            if (a > m || Double.isNaN(a)) {
                m = a;
            }
        }
        return m;
    }
}
