package org.tautline.app.ui.setup;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.ChannelCalibration;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.analysis.specimen.EndCondition;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.verdict.Limit;
import org.tautline.analysis.verdict.Specification;
import org.tautline.app.qualify.DemoScenario;
import org.tautline.driver.RigException;
import org.tautline.driver.sweep.SafetyLimits;
import org.tautline.driver.sweep.SweepPlan;

/**
 * The setup as typed: specimen, sweep plan and specification limits, each field a string, with
 * validation that names the field, what was typed and what was expected. Free of Swing.
 */
public final class SetupForm {
    private final List<SetupField> fields;
    private final List<Limit> limitTemplates;
    private final Map<String, String> values = new LinkedHashMap<>();

    private SetupForm(List<SetupField> fields, List<Limit> limitTemplates, Map<String, String> initial) {
        this.fields = List.copyOf(fields);
        this.limitTemplates = List.copyOf(limitTemplates);
        values.putAll(initial);
    }

    /** @return the form filled with the built-in demo (invented demo specimen, plan and limits) */
    public static SetupForm demo() {
        return of(DemoScenario.specimen(), DemoScenario.plan(), DemoScenario.specification());
    }

    /**
     * @param specimen the stated specimen
     * @param plan the sweep plan
     * @param specification the limits; each limit's bounds become two fields
     * @return the form showing those values
     */
    public static SetupForm of(Specimen specimen, SweepPlan plan, Specification specification) {
        return new SetupForm(SetupFields.all(specification.limits()), specification.limits(),
                SetupFields.valuesOf(specimen, plan, specification));
    }

    /** @return the fields in the order shown */
    public List<SetupField> fields() {
        return fields;
    }

    /** @return every value by key, in field order */
    public Map<String, String> values() {
        return Collections.unmodifiableMap(new LinkedHashMap<>(values));
    }

    /** @return the name of the specification, kept from the limits the form was made with */
    public List<Limit> limitTemplates() {
        return limitTemplates;
    }

    /**
     * @param key a field key
     * @return the text of that field
     */
    public String value(String key) {
        requireField(key);
        return values.getOrDefault(key, "");
    }

    /**
     * Sets a field's text.
     *
     * @param key a field key
     * @param text what was typed
     * @return true when the text changed
     */
    public boolean set(String key, String text) {
        requireField(key);
        String old = values.put(key, text == null ? "" : text);
        return !text.equals(old);
    }

    private SetupField requireField(String key) {
        for (SetupField f : fields) {
            if (f.key().equals(key)) {
                return f;
            }
        }
        throw new IllegalArgumentException("the setup form has no field '" + key + "'");
    }

    /**
     * Checks every field, then the specimen, plan and limits as a whole.
     *
     * @return problems by field key, in field order; empty when the setup is valid
     */
    public Map<String, String> problems() {
        Map<String, String> problems = new LinkedHashMap<>();
        for (SetupField f : fields) {
            FieldCheck.check(f, value(f.key())).ifPresent(message -> problems.put(f.key(), message));
        }
        if (!problems.isEmpty()) {
            return problems;
        }
        try {
            specimen();
            plan();
            specification();
            recordingCalibrations();
        } catch (AnalysisException | RigException e) {
            String message = FieldWords.withFormKeys(e.getMessage());
            problems.put(fieldNamedIn(message), FieldWords.inWords(message, fields));
        }
        return problems;
    }

    private String fieldNamedIn(String message) {
        String best = fields.get(0).key();
        int bestLength = -1;
        for (SetupField f : fields) {
            String bare = f.key().replaceFirst("^limit\\.", "").replaceFirst("\\.(lower|upper)$", "");
            if (message.contains(f.key()) && f.key().length() > bestLength) {
                best = f.key();
                bestLength = f.key().length();
            } else if (f.section() == SetupField.Section.LIMITS && message.contains("'" + labelOfLimit(bare) + "'")
                    && bestLength < 0) {
                best = f.key();
                bestLength = 0;
            }
        }
        return best;
    }

    private String labelOfLimit(String figureKey) {
        for (Limit l : limitTemplates) {
            if (l.figureKey().equals(figureKey)) {
                return l.name();
            }
        }
        return figureKey;
    }

    /** @return the stated specimen; throws when a field is wrong (call {@link #problems()} first) */
    public Specimen specimen() {
        return new Specimen(value("id").trim(), number("lengthM"), number("linearDensityKgPerM"),
                number("linearDensityStdKgPerM"), number("bendingStiffnessNm2"), number("bendingStiffnessStdNm2"),
                EndCondition.valueOf(value("ends")), number("forcingPositionM"), number("sensorPositionM"),
                number("nominalTensionN"), 0.0, 0.0, number("axialStiffnessN"), Optional.empty());
    }

    /** @return the sweep plan, a uniform one with the safety limits as typed; throws when a field is wrong */
    public SweepPlan plan() {
        SafetyLimits limits = new SafetyLimits(number("safety.driveV"), number("safety.forceN"),
                number("safety.responseAmplitude"), number("safety.displacementM"));
        return SweepPlan.uniform(number("startHz"), number("stopHz"), (int) number("stepCount"), number("settleCycles"),
                number("minSettleS"), (int) number("integrationCycles"), number("driveAmplitudeV"), number("rampS"),
                (int) number("harmonicOrder"), limits);
    }

    /**
     * @param key a field key
     * @return true for the safety-limit fields, which project files written before they existed may lack
     */
    public static boolean mayBeMissingFromOlderProjects(String key) {
        return SetupFields.SAFETY_KEYS.contains(key);
    }

    /** @return the specification with the bounds as typed; throws when a bound is wrong */
    public Specification specification() {
        List<Limit> limits = new ArrayList<>();
        for (Limit t : limitTemplates) {
            limits.add(new Limit(t.name(), t.figureKey(), t.unit(), bound(SetupFields.lowerKey(t)),
                    bound(SetupFields.upperKey(t))));
        }
        return new Specification("as set in the workbench", limits);
    }

    /**
     * The calibrations of an imported recording: channel 0 force, channel 1 the response.
     *
     * @return the two calibrations; throws when a field is wrong
     */
    public List<ChannelCalibration> recordingCalibrations() {
        return List.of(ChannelCalibration.of("0", number("forceSensitivityVPerN"), ChannelCalibration.Quantity.FORCE),
                ChannelCalibration.of("1", number("responseSensitivityVPerUnit"),
                        ChannelCalibration.Quantity.valueOf(value("responseQuantity"))));
    }

    /** @return the FRF quantity of an imported recording: receptance, mobility or accelerance, by the response sensor */
    public FrfQuantity recordingQuantity() {
        return switch (value("responseQuantity")) {
            case "VELOCITY" -> FrfQuantity.MOBILITY;
            case "ACCELERATION" -> FrfQuantity.ACCELERANCE;
            default -> FrfQuantity.RECEPTANCE;
        };
    }

    private double bound(String key) {
        String text = value(key).trim();
        return text.isEmpty() ? Double.NaN : Double.parseDouble(text);
    }

    private double number(String key) {
        return Double.parseDouble(value(key).trim());
    }

    /**
     * Fills the linear density, bending stiffness and axial stiffness of a solid round wire of a handbook material.
     *
     * @param preset the material
     * @param diameterM the wire diameter, m
     */
    public void applyMaterial(MaterialPreset preset, double diameterM) {
        Map<String, String> filled = preset.valuesFor(diameterM);
        filled.forEach(this::set);
    }

    static String format(double value) {
        if (Double.isNaN(value)) {
            return "";
        }
        return new BigDecimal(value).round(new MathContext(6)).stripTrailingZeros().toPlainString();
    }
}
