package org.tautline.driver.serial;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * One command line as the device reads it: a header, a query mark and comma-separated parameters.
 *
 * <p>SCPI-1999 style (from memory): the header is the text up to the first space, compared without
 * regard to case; a trailing {@code ?} makes it a query; parameters follow the space, separated by commas.
 * The parameter readers throw {@link CommandFault} with the codes of PROTOCOL.md, section 7.
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

    /**
     * @param count the most parameters the command takes
     * @throws CommandFault -108 when there are more
     */
    void atMost(int count) {
        if (parameters.size() > count) {
            throw new CommandFault(-108, "Parameter not allowed; " + name() + " takes " + count + " parameter(s), got "
                    + parameters.size());
        }
    }

    /**
     * @param i parameter index
     * @return the parameter as a finite number
     * @throws CommandFault -109 when missing, -104 when not a number, -222 when not finite
     */
    double number(int i) {
        if (parameters.size() <= i) {
            throw new CommandFault(-109, "Missing parameter; " + name() + " needs " + (i + 1) + " or more");
        }
        String p = parameters.get(i);
        try {
            double v = Double.parseDouble(p);
            if (!Double.isFinite(v)) {
                throw new CommandFault(-222, "Data out of range; " + p + " is not a finite number");
            }
            return v;
        } catch (NumberFormatException e) {
            throw new CommandFault(-104, "Data type error; expected a number, got " + quote(p));
        }
    }

    /**
     * @param i parameter index
     * @param min smallest value
     * @param max largest value
     * @return the parameter as a whole number in min..max
     * @throws CommandFault -222 when it is not a whole number in range
     */
    long wholeNumber(int i, long min, long max) {
        double v = number(i);
        if (v != Math.rint(v) || v < min || v > max) {
            throw new CommandFault(-222, "Data out of range; expected a whole number " + min + ".." + max + ", got "
                    + parameters.get(i));
        }
        return (long) v;
    }

    /**
     * @return true for {@code ON} or {@code 1}, false for {@code OFF} or {@code 0}
     * @throws CommandFault -109 when missing, -224 otherwise
     */
    boolean onOff() {
        if (parameters.isEmpty()) {
            throw new CommandFault(-109, "Missing parameter; " + name() + " needs ON or OFF");
        }
        return switch (parameters.get(0).toUpperCase(Locale.ROOT)) {
            case "ON", "1" -> true;
            case "OFF", "0" -> false;
            default -> throw new CommandFault(-224, "Illegal parameter value; expected ON or OFF, got "
                    + quote(parameters.get(0)));
        };
    }

    /** Shortens text quoted in an error message to 40 characters, so that replies stay far below the line limit. */
    static String quote(String text) {
        return text.length() <= 40 ? text : text.substring(0, 37) + "...";
    }
}
