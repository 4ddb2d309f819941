package org.tautline.app.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;

import org.tautline.analysis.AnalysisException;
import org.tautline.app.qualify.JsonFields;
import org.tautline.driver.RigException;
import org.tautline.driver.sweep.AdaptiveSweepPlan;
import org.tautline.driver.sweep.LevelMode;
import org.tautline.driver.sweep.SafetyLimits;
import org.tautline.driver.sweep.SweepDirection;

/** Reads an adaptive sweep plan from JSON, as driver/SWEEP_PLAN.md describes; messages name the file and the field. */
final class SweepPlanFile {
    private SweepPlanFile() {
    }

    /**
     * @param file the plan file
     * @return the plan
     * @throws IOException when the file cannot be read
     * @throws AnalysisException naming the file, the field and what was expected
     */
    static AdaptiveSweepPlan read(Path file) throws IOException {
        JsonFields plan = JsonFields.read(file, "sweep plan");
        JsonFields limits = plan.object("limits");
        try {
            return new AdaptiveSweepPlan(plan.number("startHz"), plan.number("stopHz"),
                    choice(plan, "levelMode", LevelMode.class), plan.numbers("levels"),
                    plan.number("frequencyRelStd"), plan.number("dampingRelStd"),
                    new SafetyLimits(limits.number("driveV"), limits.number("forceN"),
                            limits.number("responseAmplitude"), limits.number("displacementM")),
                    plan.has("direction") ? choice(plan, "direction", SweepDirection.class) : SweepDirection.UP,
                    plan.number("timeBudgetS"), plan.wholeNumber("coarseSteps", 35),
                    plan.number("initialDampingRatio", 0.002), plan.number("settleTolerance", 0.01),
                    plan.wholeNumber("integrationCycles", 64), plan.number("fixedDwellS", 0.0),
                    plan.number("levelTolerance", 0.01), plan.number("initialDriveV", 0.5),
                    plan.number("driveRateVPerS", 20.0), plan.number("rampS", 0.2), plan.wholeNumber("harmonicOrder", 3));
        } catch (RigException e) {
            throw new AnalysisException(plan.where() + ": " + e.getMessage().replace("sweep plan: ", ""));
        }
    }

    private static <E extends Enum<E>> E choice(JsonFields fields, String field, Class<E> type) {
        String text = fields.text(field);
        StringBuilder expected = new StringBuilder();
        for (E value : type.getEnumConstants()) {
            String name = value.name().toLowerCase(Locale.ROOT);
            if (name.equals(text)) {
                return value;
            }
            expected.append(expected.length() == 0 ? "" : ", ").append('"').append(name).append('"');
        }
        throw new AnalysisException(fields.where() + ": field \"" + field + "\" holds \"" + text + "\"; expected one of "
                + expected);
    }
}
