package org.tautline.driver.journal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import org.tautline.driver.sweep.LevelMode;
import org.tautline.driver.sweep.Refinement;
import org.tautline.driver.sweep.SafetyLimits;
import org.tautline.driver.sweep.SettleRule;
import org.tautline.driver.sweep.SweepDirection;
import org.tautline.driver.sweep.SweepPlan;

/** A sweep plan as the journal header's {@code plan.*} fields, written and read back bit for bit. */
final class PlanFields {
    private PlanFields() {
    }

    static void put(Map<String, String> f, SweepPlan plan) {
        f.put("plan.startHz", Double.toString(plan.startHz()));
        f.put("plan.stopHz", Double.toString(plan.stopHz()));
        f.put("plan.coarseSteps", Integer.toString(plan.coarseStepCount()));
        f.put("plan.settleTolerance", Double.toString(plan.settle().tolerance()));
        f.put("plan.settleCycles", Double.toString(plan.settle().cycles()));
        f.put("plan.minSettleS", Double.toString(plan.settle().minS()));
        f.put("plan.integrationCycles", Integer.toString(plan.integrationCycles()));
        f.put("plan.levelMode", plan.levelMode().name().toLowerCase(Locale.ROOT));
        StringBuilder levels = new StringBuilder();
        for (double level : plan.levels()) {
            levels.append(levels.length() == 0 ? "" : ",").append(level);
        }
        f.put("plan.levels", levels.toString());
        f.put("plan.limits.driveV", Double.toString(plan.limits().driveV()));
        f.put("plan.limits.forceN", Double.toString(plan.limits().forceN()));
        f.put("plan.limits.responseAmplitude", Double.toString(plan.limits().responseAmplitude()));
        f.put("plan.limits.displacementM", Double.toString(plan.limits().displacementM()));
        f.put("plan.direction", plan.direction().name().toLowerCase(Locale.ROOT));
        f.put("plan.refinement", plan.adaptive() ? "yes" : "none");
        plan.refinement().ifPresent(r -> {
            f.put("plan.frequencyRelStd", Double.toString(r.frequencyRelStd()));
            f.put("plan.dampingRelStd", Double.toString(r.dampingRelStd()));
            f.put("plan.timeBudgetS", Double.toString(r.timeBudgetS()));
        });
        f.put("plan.initialDampingRatio", Double.toString(plan.initialDampingRatio()));
        f.put("plan.levelTolerance", Double.toString(plan.levelTolerance()));
        f.put("plan.initialDriveV", Double.toString(plan.initialDriveV()));
        f.put("plan.driveRateVPerS", Double.toString(plan.driveRateVPerS()));
        f.put("plan.rampS", Double.toString(plan.rampS()));
        f.put("plan.harmonicOrder", Integer.toString(plan.harmonicOrder()));
    }

    static SweepPlan read(JournalLine line) {
        try {
            return plan(line);
        } catch (org.tautline.driver.RigException e) {
            throw new IllegalArgumentException("the HEADER's plan is not valid: " + e.getMessage(), e);
        }
    }

    private static SweepPlan plan(JournalLine line) {
        List<Double> levels = new ArrayList<>();
        for (String level : line.text("plan.levels").split(",")) {
            try {
                levels.add(Double.parseDouble(level));
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("HEADER field 'plan.levels' holds '" + level + "', not a number", e);
            }
        }
        Optional<Refinement> refinement = line.text("plan.refinement").equals("none") ? Optional.empty()
                : Optional.of(new Refinement(line.number("plan.frequencyRelStd"), line.number("plan.dampingRelStd"),
                        line.number("plan.timeBudgetS")));
        return new SweepPlan(line.number("plan.startHz"), line.number("plan.stopHz"),
                (int) line.whole("plan.coarseSteps"),
                new SettleRule(line.number("plan.settleTolerance"), line.number("plan.settleCycles"),
                        line.number("plan.minSettleS")),
                (int) line.whole("plan.integrationCycles"), choice(line, "plan.levelMode", LevelMode.class), levels,
                new SafetyLimits(line.number("plan.limits.driveV"), line.number("plan.limits.forceN"),
                        line.number("plan.limits.responseAmplitude"), line.number("plan.limits.displacementM")),
                choice(line, "plan.direction", SweepDirection.class), refinement,
                line.number("plan.initialDampingRatio"), line.number("plan.levelTolerance"),
                line.number("plan.initialDriveV"), line.number("plan.driveRateVPerS"), line.number("plan.rampS"),
                (int) line.whole("plan.harmonicOrder"));
    }

    static <E extends Enum<E>> E choice(JournalLine line, String key, Class<E> type) {
        String text = line.text(key);
        for (E value : type.getEnumConstants()) {
            if (value.name().toLowerCase(Locale.ROOT).equals(text)) {
                return value;
            }
        }
        throw new IllegalArgumentException(line.type() + " field '" + key + "' holds '" + text + "', which this"
                + " Tautline does not know");
    }
}
