package org.tautline.app.ui;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.analysis.modal.StabilityClass;
import org.tautline.analysis.specimen.EndCondition;
import org.tautline.analysis.specimen.TensionMethod;
import org.tautline.analysis.verdict.Figure;
import org.tautline.analysis.verdict.Outcome;
import org.tautline.driver.sweep.SweepStatus;

/**
 * Puts a message from the analysis or the rig into the words the workbench uses before it reaches a screen: figure
 * keys become their labels ({@code f1Hz} reads "fundamental frequency"), constants their labels
 * ({@code NOT_DETERMINABLE} reads "not determinable"), estimators are named by what they do, and units are
 * typographic with one "±". Free of Swing.
 *
 * <p>The estimators keep their published names in the developer documentation: the least-squares complex
 * frequency-domain estimator (LSCF; Guillaume et al., IMAC-XXI, 2003) is the "frequency-domain pole search", the
 * least-squares frequency-domain estimator of modal constants (LSFD) the "modal-constant fit".
 */
public final class PlainWords {
    private static final Map<String, String> PHRASES = new LinkedHashMap<>();
    private static final Map<String, String> CONSTANTS = new LinkedHashMap<>();
    private static final Pattern KEY = Pattern.compile("\\b[a-z][a-z0-9]*[A-Z][A-Za-z0-9]*\\b");
    private static final Pattern CONSTANT = Pattern.compile("\\b[A-Z][A-Z0-9]*(?:_[A-Z0-9]+)+\\b");

    static {
        PHRASES.put("LSCF/LSFD estimates", "estimates of the frequency-domain pole search and modal-constant fit");
        PHRASES.put("LSCF", "frequency-domain pole search");
        PHRASES.put("LSFD", "modal-constant fit");
        PHRASES.put("raise maxIterations", "allow more iterations");
        PHRASES.put("maxIterations", "the iteration limit");
        PHRASES.put("+/-", "±");
        PHRASES.put("+-", "±");
        PHRASES.put("^2", "²");
        PHRASES.put("^3", "³");
        for (Outcome o : Outcome.values()) {
            CONSTANTS.put(o.name(), o.label());
        }
        for (TensionMethod m : TensionMethod.values()) {
            CONSTANTS.put(m.name(), m.label());
        }
        for (EndCondition e : EndCondition.values()) {
            CONSTANTS.put(e.name(), e.label());
        }
        for (StabilityClass c : StabilityClass.values()) {
            CONSTANTS.put(c.name(), c.label());
        }
        for (SweepStatus s : SweepStatus.values()) {
            CONSTANTS.put(s.name(), s.label());
        }
        for (FrfQuantity q : FrfQuantity.values()) {
            CONSTANTS.put(q.name(), q.label());
        }
    }

    private PlainWords() {
    }

    /**
     * @param message a message as the analysis or the rig wrote it; null is taken as empty
     * @return the message in the workbench's words
     */
    public static String of(String message) {
        if (message == null) {
            return "";
        }
        String out = message;
        for (Map.Entry<String, String> e : PHRASES.entrySet()) {
            out = out.replace(e.getKey(), e.getValue());
        }
        out = replace(KEY, out, key -> Figure.byKey(key).map(Figure::label).orElse(key));
        out = replace(CONSTANT, out, c -> CONSTANTS.getOrDefault(c, c));
        // PASS and FAIL have no underscore: only where they stand as a word in capitals.
        out = out.replaceAll("\\bPASS\\b", Outcome.PASS.label()).replaceAll("\\bFAIL\\b", Outcome.FAIL.label());
        return out;
    }

    private static String replace(Pattern p, String text, java.util.function.UnaryOperator<String> how) {
        Matcher m = p.matcher(text);
        StringBuilder out = new StringBuilder();
        while (m.find()) {
            m.appendReplacement(out, Matcher.quoteReplacement(how.apply(m.group())));
        }
        m.appendTail(out);
        return out.toString();
    }
}
