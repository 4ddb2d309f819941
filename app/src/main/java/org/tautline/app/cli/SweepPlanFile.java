package org.tautline.app.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.tautline.analysis.AnalysisException;
import org.tautline.app.qualify.JsonFields;
import org.tautline.driver.RigException;
import org.tautline.driver.sweep.LevelMode;
import org.tautline.driver.sweep.Refinement;
import org.tautline.driver.sweep.SafetyLimits;
import org.tautline.driver.sweep.SettleRule;
import org.tautline.driver.sweep.SweepDirection;
import org.tautline.driver.sweep.SweepPlan;

/** Reads a sweep plan from JSON, as driver/SWEEP_PLAN.md describes; messages name the file and the field. */
final class SweepPlanFile {
    /** Every field a plan may hold. */
    static final List<String> FIELDS = List.of("startHz", "stopHz", "levelMode", "levels", "refine", "frequencyRelStd",
            "dampingRelStd", "timeBudgetS", "limits", "direction", "coarseSteps", "initialDampingRatio", "settleTolerance",
            "fixedDwellS", "integrationCycles", "levelTolerance", "initialDriveV", "driveRateVPerS", "rampS",
            "harmonicOrder");
    /** Every field the limits object must hold. */
    static final List<String> LIMIT_FIELDS = List.of("driveV", "forceN", "responseAmplitude", "displacementM");
    private static final List<String> TARGETS = List.of("frequencyRelStd", "dampingRelStd", "timeBudgetS");

    private SweepPlanFile() {
    }

    /**
     * @param file the plan file
     * @return the plan
     * @throws IOException when the file cannot be read
     * @throws AnalysisException naming the file, the field and what was expected
     */
    static SweepPlan read(Path file) throws IOException {
        JsonFields plan = JsonFields.read(file, "sweep plan");
        plan.refuseUnknown(FIELDS);
        JsonFields limits = plan.object("limits");
        limits.refuseUnknown(LIMIT_FIELDS);
        boolean refine = !plan.has("refine") || bool(plan, "refine");
        Optional<Refinement> refinement = Optional.empty();
        try {
            if (refine) {
                refinement = Optional.of(new Refinement(plan.number("frequencyRelStd"), plan.number("dampingRelStd"),
                        plan.number("timeBudgetS")));
            } else {
                for (String target : TARGETS) {
                    if (plan.has(target)) {
                        throw new AnalysisException(plan.where() + ": field \"" + target + "\" is a refinement target,"
                                + " but \"refine\" is false; remove it, or set \"refine\" to true");
                    }
                }
            }
            double dwellS = plan.number("fixedDwellS", 0.0);
            if (dwellS != 0 && plan.has("settleTolerance")) {
                throw new AnalysisException(plan.where() + ": fields \"fixedDwellS\" and \"settleTolerance\" exclude"
                        + " each other: give a fixed dwell, or a tolerance for settle detection");
            }
            SettleRule settle = dwellS > 0 ? SettleRule.fixed(0.0, dwellS)
                    : SettleRule.detected(plan.number("settleTolerance", 0.01));
            return new SweepPlan(plan.number("startHz"), plan.number("stopHz"), plan.wholeNumber("coarseSteps", 35),
                    settle, plan.wholeNumber("integrationCycles", 64), choice(plan, "levelMode", LevelMode.class),
                    plan.numbers("levels"),
                    new SafetyLimits(limits.number("driveV"), limits.number("forceN"),
                            limits.number("responseAmplitude"), limits.number("displacementM")),
                    plan.has("direction") ? choice(plan, "direction", SweepDirection.class) : SweepDirection.UP,
                    refinement, plan.number("initialDampingRatio", 0.002), plan.number("levelTolerance", 0.01),
                    plan.number("initialDriveV", 0.5), plan.number("driveRateVPerS", 20.0), plan.number("rampS", 0.2),
                    plan.wholeNumber("harmonicOrder", 3));
        } catch (RigException e) {
            throw new AnalysisException(plan.where() + ": " + e.getMessage().replace("sweep plan: ", ""));
        }
    }

    private static boolean bool(JsonFields fields, String field) {
        String text = fields.rawText(field);
        if (text.equals("true") || text.equals("false")) {
            return text.equals("true");
        }
        throw new AnalysisException(fields.where() + ": field \"" + field + "\" holds " + text + "; expected true or false");
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
