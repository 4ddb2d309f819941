package org.tautline.app.qualify;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.verdict.Figure;
import org.tautline.analysis.verdict.Limit;
import org.tautline.analysis.verdict.Specification;

/**
 * Reads a specification (our own JSON format, documented in the README): a name, optionally a revision, and limits
 * on figures, each limit with {@code "name"}, {@code "figure"}, {@code "unit"} and a {@code "lower"} and/or
 * {@code "upper"} bound.
 *
 * <p>The whole file is checked when it is read, against the {@link Figure} set: a figure that does not exist (a
 * misspelling), a unit that is not the figure's, a figure limited twice, a bound written as {@code null}, a field
 * the format does not have, are each refused with the file, the limit and what was expected. A specification that
 * is read is therefore one every limit of which can be judged.
 */
public final class SpecificationFile {
    /** The fields of the file. */
    static final List<String> FIELDS = List.of("name", "revision", "limits");
    /** The fields of one limit. */
    static final List<String> LIMIT_FIELDS = List.of("name", "figure", "unit", "lower", "upper");

    private SpecificationFile() {
    }

    /**
     * Reads the file.
     *
     * @param file the JSON file
     * @return the specification, its units in the figures' own spelling
     * @throws IOException when the file cannot be read
     * @throws AnalysisException naming the file, the limit and what was expected
     */
    public static Specification read(Path file) throws IOException {
        JsonFields json = JsonFields.read(file, "specification");
        json.refuseUnknown(FIELDS);
        String name = json.text("name");
        String revision = json.has("revision") ? json.text("revision") : "";
        List<Limit> limits = new ArrayList<>();
        Map<String, String> where = new LinkedHashMap<>();
        for (JsonFields limit : json.objects("limits")) {
            try {
                limit.refuseUnknown(LIMIT_FIELDS);
                Figure figure = Figure.require(limit.text("figure"));
                String written = limit.text("unit");
                String unit = figure.unitFor(written).orElseThrow(() -> new AnalysisException("unit '" + written
                        + "' is not the unit of " + figure.key() + " (" + figure.label() + "); expected '" + figure.unit()
                        + "'" + (figure.unit().isEmpty() ? " (a dimensionless figure)" : "")));
                if (where.containsKey(figure.key())) {
                    throw new AnalysisException("figure " + figure.key() + " is limited a second time; it was limited"
                            + " already at " + where.get(figure.key()) + " (one limit per figure, with both bounds)");
                }
                limits.add(new Limit(limit.text("name"), figure.key(), unit, bound(limit, "lower"),
                        bound(limit, "upper")));
                where.put(figure.key(), limit.where());
            } catch (AnalysisException e) {
                throw e.getMessage().startsWith(limit.where()) ? e
                        : new AnalysisException(limit.where() + ": " + e.getMessage(), e);
            }
        }
        try {
            return new Specification(name, revision, limits);
        } catch (AnalysisException e) {
            throw new AnalysisException(json.where() + ": " + e.getMessage(), e);
        }
    }

    private static double bound(JsonFields limit, String field) {
        if (limit.holdsNull(field)) {
            throw new AnalysisException("field \"" + field + "\" is null; expected a number, or leave the field out for"
                    + " no " + field + " bound");
        }
        return limit.number(field, Double.NaN);
    }
}
