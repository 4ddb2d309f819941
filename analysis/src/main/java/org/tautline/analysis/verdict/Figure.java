package org.tautline.analysis.verdict;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.tautline.analysis.AnalysisException;

/**
 * A figure a qualification measures and a specification may limit: its key, its SI unit, its name for people and
 * where its uncertainty comes from.
 *
 * <p>The set is closed: {@link #byKey(String)} knows every figure, so a specification naming one that does not exist
 * (a misspelling) or giving it in another unit is refused when it is read, not judged "not determinable" later.
 * Units are written in ASCII with {@code ^} for powers ({@code "N m^2"}); {@link #unitFor(String)} also takes the
 * usual typographic spelling ({@code "N m²"}, {@code "N·m²"}). Damping ratios are per harmonic:
 * {@code dampingRatio1}, {@code dampingRatio2}, ...
 *
 * @param key the key in specifications, results and the lot register, for example {@code tensionN}
 * @param unit the SI unit, ASCII; empty for a dimensionless figure
 * @param label what the figure is called for people, for example "tension"
 * @param uncertainty where its standard uncertainty comes from, in words
 */
public record Figure(String key, String unit, String label, String uncertainty) {
    /** The first natural frequency (its strongest polarisation). */
    public static final Figure F1 = new Figure("f1Hz", "Hz", "fundamental frequency",
            "standard error of the joint modal refinement");
    /** The tension from the harmonic series. */
    public static final Figure TENSION = new Figure("tensionN", "N", "tension",
            "weighted line fit of the harmonic series, with the stated mass per length's uncertainty");
    /** The bending stiffness from the harmonic series. */
    public static final Figure BENDING_STIFFNESS = new Figure("bendingStiffnessNm2", "N m^2", "bending stiffness EI",
            "weighted line fit of the harmonic series, with the stated mass per length's uncertainty");
    /** Fletcher's inharmonicity coefficient B. */
    public static final Figure INHARMONICITY = new Figure("inharmonicityB", "", "inharmonicity B",
            "from the tension's and the bending stiffness's uncertainties");
    /** The stinger position from the pattern of modal constants. */
    public static final Figure FORCING_POSITION = new Figure("forcingPositionM", "m", "stinger position",
            "fit of the measured modal constants to the pattern point forcing gives");
    /** The response sensor position from the pattern of modal constants. */
    public static final Figure SENSOR_POSITION = new Figure("sensorPositionM", "m", "sensor position",
            "fit of the measured modal constants to the pattern point forcing gives");
    /** How much of the FRF the modal model leaves unexplained. */
    public static final Figure FIT_RESIDUAL = new Figure("fitNormalisedResidual", "", "normalised residual of the fit",
            "none: a quality figure, judged as it stands");
    /** The worst standard error of the FRF near a resonance. */
    public static final Figure RESONANCE_ERROR = new Figure("resonanceFrfRelativeStdError", "",
            "FRF standard error at resonances", "none: a quality figure, judged as it stands");
    /** The relative shift of f1 between two drive levels. */
    public static final Figure LEVEL_SHIFT = new Figure("linearityShift1", "", "shift of f1 between test levels",
            "standard errors of f1 at the two levels");
    private static final String DAMPING_PREFIX = "dampingRatio";
    /** Highest harmonic whose damping ratio a specification may name. */
    public static final int MAX_DAMPING_HARMONIC = 60;
    private static final List<Figure> FIXED = List.of(F1, TENSION, BENDING_STIFFNESS, INHARMONICITY, FORCING_POSITION,
            SENSOR_POSITION, FIT_RESIDUAL, RESONANCE_ERROR, LEVEL_SHIFT);

    /**
     * The damping ratio of one harmonic.
     *
     * @param harmonic n, 1 to {@value #MAX_DAMPING_HARMONIC}
     * @return the figure {@code dampingRatio<n>}
     */
    public static Figure damping(int harmonic) {
        if (harmonic < 1 || harmonic > MAX_DAMPING_HARMONIC) {
            throw new AnalysisException("a damping figure names a harmonic from 1 to " + MAX_DAMPING_HARMONIC + ", got "
                    + harmonic);
        }
        return new Figure(DAMPING_PREFIX + harmonic, "", "damping ratio of harmonic " + harmonic,
                "standard error of the joint modal refinement");
    }

    /**
     * @param key a figure key
     * @return the figure, or empty when no figure has that key (letter case counts)
     */
    public static Optional<Figure> byKey(String key) {
        for (Figure f : FIXED) {
            if (f.key.equals(key)) {
                return Optional.of(f);
            }
        }
        if (key != null && key.startsWith(DAMPING_PREFIX) && key.length() > DAMPING_PREFIX.length()) {
            String n = key.substring(DAMPING_PREFIX.length());
            if (n.chars().allMatch(Character::isDigit) && n.length() <= 2 && !n.startsWith("0")) {
                int h = Integer.parseInt(n);
                if (h <= MAX_DAMPING_HARMONIC) {
                    return Optional.of(damping(h));
                }
            }
        }
        return Optional.empty();
    }

    /**
     * The figure of a key, or an error that says which keys exist and which one was probably meant.
     *
     * @param key a figure key
     * @return the figure
     * @throws AnalysisException naming the key, the likely one and the known ones
     */
    public static Figure require(String key) {
        return byKey(key).orElseThrow(() -> new AnalysisException("figure '" + key + "' does not exist"
                + likelyMeant(key).map(k -> " (did you mean '" + k + "'?)").orElse("") + "; expected one of "
                + String.join(", ", knownKeys())));
    }

    /**
     * What a figure is called for people, from its key: the label of a known figure; a key no figure has (one kept
     * in a register written by another version) is shown as it stands, quoted, so it is not taken for a label.
     *
     * @param key a figure key
     * @return its label, for example "tension" for {@code tensionN}
     */
    public static String labelFor(String key) {
        return byKey(key).map(Figure::label).orElse("'" + key + "'");
    }

    /** @return every key, the damping ratios written once as {@code dampingRatio1 .. dampingRatio60} */
    public static List<String> knownKeys() {
        List<String> keys = new ArrayList<>();
        FIXED.forEach(f -> keys.add(f.key));
        keys.add(DAMPING_PREFIX + "1 .. " + DAMPING_PREFIX + MAX_DAMPING_HARMONIC);
        return keys;
    }

    /**
     * @param written a unit as a file writes it
     * @return this figure's unit when {@code written} is one of its spellings (the ASCII form, or with ², ³, · or a
     *         middle dot, or {@code "1"} / {@code "-"} for a dimensionless figure), otherwise empty
     */
    public Optional<String> unitFor(String written) {
        if (written == null) {
            return Optional.empty();
        }
        String w = written.strip().replace("²", "^2").replace("³", "^3").replace("·", " ").replace("*", " ")
                .replaceAll("\\s+", " ");
        if (w.equals(unit) || (unit.isEmpty() && (w.equals("1") || w.equals("-")))) {
            return Optional.of(unit);
        }
        return Optional.empty();
    }

    /** @return the unit for people: the typographic form ({@code N m²}), or "no unit" */
    public String unitLabel() {
        return unitLabel(unit);
    }

    /**
     * @param unit a unit in the ASCII form figures use ({@code "N m^2"}), empty for none
     * @return the unit for people: the typographic form ({@code N m²}), or "no unit"
     */
    public static String unitLabel(String unit) {
        return unit.isBlank() ? "no unit" : unit.replace("^2", "²").replace("^3", "³");
    }

    /** A key that differs from a known one only in letter case, or by one or two letters. */
    private static Optional<String> likelyMeant(String key) {
        if (key == null) {
            return Optional.empty();
        }
        String lower = key.toLowerCase(Locale.ROOT);
        String best = null;
        int bestDistance = 3;
        List<String> candidates = new ArrayList<>();
        FIXED.forEach(f -> candidates.add(f.key));
        for (int n = 1; n <= MAX_DAMPING_HARMONIC; n++) {
            candidates.add(DAMPING_PREFIX + n);
        }
        for (String k : candidates) {
            int d = distance(lower, k.toLowerCase(Locale.ROOT));
            if (d < bestDistance) {
                bestDistance = d;
                best = k;
            }
        }
        return Optional.ofNullable(best);
    }

    /** Levenshtein's edit distance (V. I. Levenshtein, Soviet Physics Doklady 10:707, 1966, from memory). */
    private static int distance(String a, String b) {
        int[] previous = new int[b.length() + 1];
        int[] current = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            previous[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            current[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                current[j] = Math.min(Math.min(current[j - 1] + 1, previous[j] + 1), previous[j - 1] + cost);
            }
            int[] t = previous;
            previous = current;
            current = t;
        }
        return previous[b.length()];
    }
}
