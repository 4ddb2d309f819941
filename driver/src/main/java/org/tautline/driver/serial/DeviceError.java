package org.tautline.driver.serial;

/**
 * An entry of the device's error queue: a code and a message, as {@code SYST:ERR?} answers it.
 *
 * <p>Negative codes are the SCPI-1999 standard errors (from memory): -100 command error, -102 syntax
 * error, -109 missing parameter, -113 undefined header, -222 data out of range, -224 illegal parameter
 * value, -350 queue overflow. Positive codes are this protocol's own, listed in PROTOCOL.md.
 *
 * @param code 0 for "No error", negative for standard errors, positive for device errors
 * @param message the text, without quotes
 */
record DeviceError(int code, String message) {
    /** The answer of an empty queue. */
    static final DeviceError NONE = new DeviceError(0, "No error");

    /** @return the reply line: {@code code,"message"} with any double quote doubled */
    String reply() {
        return code + ",\"" + message.replace("\"", "\"\"") + "\"";
    }

    /**
     * Parses a {@code SYST:ERR?} reply.
     *
     * @param reply the line
     * @return the entry, or null when the line is not of the form {@code code,"message"}
     */
    static DeviceError parse(String reply) {
        int comma = reply.indexOf(',');
        if (comma < 1) {
            return null;
        }
        String text = reply.substring(comma + 1).strip();
        if (text.length() < 2 || text.charAt(0) != '"' || text.charAt(text.length() - 1) != '"') {
            return null;
        }
        try {
            int code = Integer.parseInt(reply.substring(0, comma).strip());
            return new DeviceError(code, text.substring(1, text.length() - 1).replace("\"\"", "\""));
        } catch (NumberFormatException e) {
            return null;
        }
    }
}
