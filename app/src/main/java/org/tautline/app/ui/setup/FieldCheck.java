package org.tautline.app.ui.setup;

import java.util.Optional;

/** Checks the text of one field on its own: the message says what was typed and what was expected. */
final class FieldCheck {
    private FieldCheck() {
    }

    static Optional<String> check(SetupField field, String text) {
        String t = text == null ? "" : text.trim();
        String expected = field.kind().expected() + (field.unit().isEmpty() ? "" : " of " + field.unit());
        switch (field.kind()) {
            case TEXT:
                return t.isEmpty() ? Optional.of("must not be empty; expected " + expected) : Optional.empty();
            case CHOICE:
                return field.choices().contains(t) ? Optional.empty()
                        : Optional.of("got '" + t + "'; expected one of " + String.join(", ", field.choices().stream()
                                .map(c -> ChoiceLabels.of(field.key(), c)).toList()));
            case OPTIONAL_NUMBER:
                if (t.isEmpty()) {
                    return Optional.empty();
                }
                return parse(t).isPresent() ? Optional.empty() : Optional.of(got(t, expected));
            default:
                Optional<Double> value = parse(t);
                if (value.isEmpty()) {
                    return Optional.of(got(t, expected));
                }
                double v = value.get();
                boolean ok = switch (field.kind()) {
                    case POSITIVE -> v > 0;
                    case NON_NEGATIVE -> v >= 0;
                    case WHOLE -> v == Math.rint(v) && Math.abs(v) < Integer.MAX_VALUE;
                    default -> true;
                };
                return ok ? Optional.empty() : Optional.of(got(t, expected));
        }
    }

    private static String got(String text, String expected) {
        return "got '" + text + "'; expected " + expected;
    }

    private static Optional<Double> parse(String text) {
        try {
            double v = Double.parseDouble(text);
            return Double.isFinite(v) ? Optional.of(v) : Optional.empty();
        } catch (NumberFormatException e) {
            return Optional.empty();
        }
    }
}
