package org.tautline.app.trace;

import java.time.Instant;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.Function;

import org.tautline.analysis.AnalysisException;

/**
 * What a run's traceability needs beside its data: when it was tested, in what air, on which rig. Recorded in the run
 * folder ({@link SetupFile}); a fact not given is absent and printed as "not given".
 *
 * @param testedAt when the run was made (the test date, not the report date)
 * @param temperatureC air temperature at the specimen, °C (it changes tension and damping)
 * @param relativeHumidityPct relative humidity, %
 * @param rig the rig and its instruments as they were at the test
 */
public record RunSetup(Optional<Instant> testedAt, OptionalDouble temperatureC, OptionalDouble relativeHumidityPct,
                       Optional<RigDescription> rig) {
    /** Nothing given. */
    public static final RunSetup NONE = new RunSetup(Optional.empty(), OptionalDouble.empty(), OptionalDouble.empty(),
            Optional.empty());
    /** Lowest and highest air temperatures taken as plausible for a lab, °C. */
    static final double LOWEST_C = -60;
    static final double HIGHEST_C = 150;

    /** Checks the values: no null, a humidity from 0 to 100 %, a temperature a lab could have. */
    public RunSetup {
        Objects.requireNonNull(testedAt, "testedAt");
        Objects.requireNonNull(temperatureC, "temperatureC");
        Objects.requireNonNull(relativeHumidityPct, "relativeHumidityPct");
        Objects.requireNonNull(rig, "rig");
        if (temperatureC.isPresent() && !(temperatureC.getAsDouble() >= LOWEST_C && temperatureC.getAsDouble() <= HIGHEST_C)) {
            throw new AnalysisException("temperature " + temperatureC.getAsDouble() + " °C; expected the air temperature"
                    + " at the specimen in °C, from " + LOWEST_C + " to " + HIGHEST_C);
        }
        if (relativeHumidityPct.isPresent() && !(relativeHumidityPct.getAsDouble() >= 0
                && relativeHumidityPct.getAsDouble() <= 100)) {
            throw new AnalysisException("relative humidity " + relativeHumidityPct.getAsDouble() + " %; expected 0 to 100 %");
        }
    }

    /**
     * Fills what this setup lacks from another (the command line's), refusing a value that differs from a recorded
     * one: what was recorded at the test is never replaced.
     *
     * @param given the values given now
     * @param recordedIn where this setup was recorded, for messages
     * @return the setup with both
     * @throws AnalysisException naming the field, both values and where the recorded one is
     */
    public RunSetup with(RunSetup given, String recordedIn) {
        return new RunSetup(pick(testedAt, given.testedAt, "test date", recordedIn, Object::toString),
                pickNumber(temperatureC, given.temperatureC, "temperature (°C)", recordedIn),
                pickNumber(relativeHumidityPct, given.relativeHumidityPct, "relative humidity (%)", recordedIn),
                pick(rig, given.rig, "rig", recordedIn, RigDescription::name));
    }

    private static <T> Optional<T> pick(Optional<T> recorded, Optional<T> given, String what, String recordedIn,
                                        Function<T, String> show) {
        if (recorded.isPresent() && given.isPresent() && !recorded.get().equals(given.get())) {
            throw new AnalysisException(recordedIn + " records the " + what + " " + show.apply(recorded.get())
                    + "; the " + what + " given now (" + show.apply(given.get()) + ") differs, and a value recorded at the"
                    + " test is not replaced; leave the option out, or report another run folder");
        }
        return recorded.isPresent() ? recorded : given;
    }

    private static OptionalDouble pickNumber(OptionalDouble recorded, OptionalDouble given, String what, String recordedIn) {
        Optional<Double> chosen = pick(box(recorded), box(given), what, recordedIn, Object::toString);
        return chosen.map(OptionalDouble::of).orElse(OptionalDouble.empty());
    }

    private static Optional<Double> box(OptionalDouble d) {
        return d.isPresent() ? Optional.of(d.getAsDouble()) : Optional.empty();
    }
}
