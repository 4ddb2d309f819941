package org.tautline.app.qualify;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.verdict.Limit;
import org.tautline.analysis.verdict.Specification;

/**
 * Reads a specification (our own JSON format, documented in the README): a name and limits on
 * figures, each limit with {@code "name"}, {@code "figure"}, {@code "unit"} and a {@code "lower"}
 * and/or {@code "upper"} bound.
 */
public final class SpecificationFile {
    private SpecificationFile() {
    }

    /**
     * Reads the file.
     *
     * @param file the JSON file
     * @return the specification
     * @throws IOException when the file cannot be read
     */
    public static Specification read(Path file) throws IOException {
        JsonFields json = JsonFields.read(file, "specification");
        String name = json.text("name");
        List<Limit> limits = new ArrayList<>();
        for (JsonFields limit : json.objects("limits")) {
            try {
                limits.add(new Limit(limit.text("name"), limit.text("figure"), limit.text("unit"),
                        limit.number("lower", Double.NaN), limit.number("upper", Double.NaN)));
            } catch (AnalysisException e) {
                throw e.getMessage().startsWith(limit.where()) ? e
                        : new AnalysisException(limit.where() + ": " + e.getMessage(), e);
            }
        }
        try {
            return new Specification(name, limits);
        } catch (AnalysisException e) {
            throw new AnalysisException(json.where() + ": " + e.getMessage(), e);
        }
    }
}
