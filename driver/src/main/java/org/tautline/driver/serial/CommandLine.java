package org.tautline.driver.serial;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * One command line as the device reads it: a header, a query mark and comma-separated parameters.
 *
 * <p>SCPI-1999 style (from memory): the header is the text up to the first space, compared without
 * regard to case; a trailing {@code ?} makes it a query; parameters follow the space, separated by commas.
 *
 * @param header the header in upper case, without the query mark, for example {@code DRIVE:SINE}
 * @param query true when the header ended with {@code ?}
 * @param parameters the parameters, trimmed, possibly none
 */
record CommandLine(String header, boolean query, List<String> parameters) {

    /** Copies the list. */
    CommandLine {
        parameters = List.copyOf(parameters);
    }

    /**
     * Parses a line.
     *
     * @param text the line, without its terminator
     * @return the command, or null for a blank line
     */
    static CommandLine parse(String text) {
        String t = text.strip();
        if (t.isEmpty()) {
            return null;
        }
        int space = t.indexOf(' ');
        String head = space < 0 ? t : t.substring(0, space);
        String rest = space < 0 ? "" : t.substring(space + 1).strip();
        boolean query = head.endsWith("?");
        if (query) {
            head = head.substring(0, head.length() - 1);
        }
        List<String> params = new ArrayList<>();
        if (!rest.isEmpty()) {
            for (String p : rest.split(",", -1)) {
                params.add(p.strip());
            }
        }
        return new CommandLine(head.toUpperCase(Locale.ROOT), query, params);
    }

    /** @return the header with the query mark, as written in PROTOCOL.md */
    String name() {
        return query ? header + "?" : header;
    }
}
