package org.tautline.app.ui.setup;

import static org.tautline.app.ui.setup.SetupField.Kind.CHOICE;
import static org.tautline.app.ui.setup.SetupField.Kind.NON_NEGATIVE;
import static org.tautline.app.ui.setup.SetupField.Kind.OPTIONAL_NUMBER;
import static org.tautline.app.ui.setup.SetupField.Kind.POSITIVE;
import static org.tautline.app.ui.setup.SetupField.Kind.TEXT;
import static org.tautline.app.ui.setup.SetupField.Kind.WHOLE;
import static org.tautline.app.ui.setup.SetupField.Section.LIMITS;
import static org.tautline.app.ui.setup.SetupField.Section.PLAN;
import static org.tautline.app.ui.setup.SetupField.Section.SAFETY;
import static org.tautline.app.ui.setup.SetupField.Section.SENSORS;
import static org.tautline.app.ui.setup.SetupField.Section.SPECIMEN;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.tautline.analysis.specimen.EndCondition;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.verdict.Figure;
import org.tautline.analysis.verdict.Limit;
import org.tautline.analysis.verdict.Specification;
import org.tautline.driver.sweep.SweepPlan;

/** The fields of the setup form, and the values of a specimen, plan and specification as text. */
final class SetupFields {
    private SetupFields() {
    }

    static List<SetupField> all(List<Limit> limits) {
        List<SetupField> f = new ArrayList<>();
        f.add(SetupField.of("id", SPECIMEN, "Specimen id", "", TEXT));
        f.add(SetupField.of("lengthM", SPECIMEN, "Span (vibrating length)", "m", POSITIVE));
        f.add(new SetupField("ends", SPECIMEN, "Ends", "", CHOICE, List.of(EndCondition.PINNED.name(),
                EndCondition.CLAMPED.name())));
        f.add(SetupField.of("linearDensityKgPerM", SPECIMEN, "Mass per length", "kg/m", POSITIVE));
        f.add(SetupField.of("linearDensityStdKgPerM", SPECIMEN, "  its standard uncertainty", "kg/m", NON_NEGATIVE));
        f.add(SetupField.of("bendingStiffnessNm2", SPECIMEN, "Bending stiffness EI", "N m²", NON_NEGATIVE));
        f.add(SetupField.of("bendingStiffnessStdNm2", SPECIMEN, "  its standard uncertainty", "N m²", NON_NEGATIVE));
        f.add(SetupField.of("axialStiffnessN", SPECIMEN, "Axial stiffness EA (0 if unknown)", "N", NON_NEGATIVE));
        f.add(SetupField.of("forcingPositionM", SPECIMEN, "Forcing point from the left end", "m", POSITIVE));
        f.add(SetupField.of("sensorPositionM", SPECIMEN, "Response sensor from the left end", "m", POSITIVE));
        f.add(SetupField.of("nominalTensionN", SPECIMEN, "Nominal tension", "N", POSITIVE));
        f.add(SetupField.of("forceSensitivityVPerN", SENSORS, "Force sensor sensitivity", "V/N", POSITIVE));
        f.add(new SetupField("responseQuantity", SENSORS, "Response sensor measures", "", CHOICE, List.of(
                "DISPLACEMENT", "VELOCITY", "ACCELERATION")));
        f.add(SetupField.of("responseSensitivityVPerUnit", SENSORS, "Response sensor sensitivity", "V per SI unit",
                POSITIVE));
        f.add(SetupField.of("startHz", PLAN, "Band start", "Hz", POSITIVE));
        f.add(SetupField.of("stopHz", PLAN, "Band stop", "Hz", POSITIVE));
        f.add(SetupField.of("stepCount", PLAN, "Steps (log-spaced)", "", WHOLE));
        f.add(SetupField.of("settleCycles", PLAN, "Settle per step", "cycles", NON_NEGATIVE));
        f.add(SetupField.of("minSettleS", PLAN, "Shortest settle", "s", NON_NEGATIVE));
        f.add(SetupField.of("integrationCycles", PLAN, "Fitted per step", "cycles", WHOLE));
        f.add(SetupField.of("driveAmplitudeV", PLAN, "Drive amplitude (peak)", "V", POSITIVE));
        f.add(SetupField.of("rampS", PLAN, "Ramp up / down", "s", NON_NEGATIVE));
        f.add(SetupField.of("harmonicOrder", PLAN, "Highest harmonic fitted", "", WHOLE));
        f.add(SetupField.of("safety.driveV", SAFETY, "Drive never above", "V", POSITIVE));
        f.add(SetupField.of("safety.forceN", SAFETY, "Stop when the force reaches", "N", POSITIVE));
        f.add(SetupField.of("safety.responseAmplitude", SAFETY, "Stop when the response reaches", "sensor's unit",
                POSITIVE));
        f.add(SetupField.of("safety.displacementM", SAFETY, "Stop when the specimen moves", "m", POSITIVE));
        for (Limit l : limits) {
            String label = Character.toUpperCase(l.name().charAt(0)) + l.name().substring(1);
            String unit = l.unit().isBlank() ? "" : Figure.unitLabel(l.unit());
            f.add(SetupField.of(lowerKey(l), LIMITS, label + ": at least", unit, OPTIONAL_NUMBER));
            f.add(SetupField.of(upperKey(l), LIMITS, label + ": at most", unit, OPTIONAL_NUMBER));
        }
        return f;
    }

    static String lowerKey(Limit limit) {
        return "limit." + limit.figureKey() + ".lower";
    }

    static String upperKey(Limit limit) {
        return "limit." + limit.figureKey() + ".upper";
    }

    /** The safety-limit fields, which project files written before they existed may lack. */
    static final List<String> SAFETY_KEYS = List.of("safety.driveV", "safety.forceN", "safety.responseAmplitude",
            "safety.displacementM");

    static Map<String, String> valuesOf(Specimen s, SweepPlan p, Specification spec) {
        Map<String, String> v = new LinkedHashMap<>();
        v.put("id", s.id());
        v.put("lengthM", SetupForm.format(s.lengthM()));
        v.put("ends", s.ends().name());
        v.put("linearDensityKgPerM", SetupForm.format(s.linearDensityKgPerM()));
        v.put("linearDensityStdKgPerM", SetupForm.format(s.linearDensityStdKgPerM()));
        v.put("bendingStiffnessNm2", SetupForm.format(s.bendingStiffnessNm2()));
        v.put("bendingStiffnessStdNm2", SetupForm.format(s.bendingStiffnessStdNm2()));
        v.put("axialStiffnessN", SetupForm.format(s.axialStiffnessN()));
        v.put("forcingPositionM", SetupForm.format(s.forcingPositionM()));
        v.put("sensorPositionM", SetupForm.format(s.sensorPositionM()));
        v.put("nominalTensionN", SetupForm.format(s.nominalTensionN()));
        // A recording already in newtons and metres: unit sensitivities.
        v.put("forceSensitivityVPerN", "1");
        v.put("responseQuantity", "DISPLACEMENT");
        v.put("responseSensitivityVPerUnit", "1");
        v.put("startHz", SetupForm.format(p.startHz()));
        v.put("stopHz", SetupForm.format(p.stopHz()));
        v.put("stepCount", Integer.toString(p.coarseStepCount()));
        v.put("settleCycles", SetupForm.format(p.settle().cycles()));
        v.put("minSettleS", SetupForm.format(p.settle().minS()));
        v.put("integrationCycles", Integer.toString(p.integrationCycles()));
        v.put("driveAmplitudeV", SetupForm.format(p.levels().get(0)));
        v.put("rampS", SetupForm.format(p.rampS()));
        v.put("harmonicOrder", Integer.toString(p.harmonicOrder()));
        v.put("safety.driveV", SetupForm.format(p.limits().driveV()));
        v.put("safety.forceN", SetupForm.format(p.limits().forceN()));
        v.put("safety.responseAmplitude", SetupForm.format(p.limits().responseAmplitude()));
        v.put("safety.displacementM", SetupForm.format(p.limits().displacementM()));
        for (Limit l : spec.limits()) {
            v.put(lowerKey(l), SetupForm.format(l.lowerBound()));
            v.put(upperKey(l), SetupForm.format(l.upperBound()));
        }
        return v;
    }
}
