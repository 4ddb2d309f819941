package org.tautline.driver.journal;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.zip.CRC32;

/**
 * One journal record as a line of text: {@code TYPE key=value ... crc=HHHHHHHH}, see {@link JournalWriter}.
 *
 * @param type the record type, upper case
 * @param fields key to value, in the order written
 */
record JournalLine(String type, Map<String, String> fields) {
    private static final String CRC_KEY = " crc=";

    JournalLine {
        fields = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(fields));
    }

    /** @return the line's bytes, UTF-8, ending in a line feed */
    byte[] encode() {
        StringBuilder line = new StringBuilder(type);
        for (Map.Entry<String, String> e : fields.entrySet()) {
            line.append(' ').append(e.getKey()).append('=').append(escape(e.getValue()));
        }
        String body = line.toString();
        return (body + CRC_KEY + crcHex(body.getBytes(StandardCharsets.US_ASCII)) + "\n").getBytes(StandardCharsets.US_ASCII);
    }

    /**
     * Decodes a line whose CRC matches.
     *
     * @param bytes the line without its line feed
     * @return the record, or null when the CRC is missing or does not match (a torn or damaged line)
     * @throws IllegalArgumentException when the CRC matches but the line is not key=value pairs
     */
    static JournalLine decode(byte[] bytes) {
        String text = new String(bytes, StandardCharsets.US_ASCII);
        int at = text.lastIndexOf(CRC_KEY);
        if (at < 0 || text.length() != at + CRC_KEY.length() + 8) {
            return null;
        }
        String body = text.substring(0, at);
        if (!crcHex(body.getBytes(StandardCharsets.US_ASCII)).equals(text.substring(at + CRC_KEY.length()))) {
            return null;
        }
        String[] parts = body.split(" ");
        Map<String, String> fields = new LinkedHashMap<>();
        for (int i = 1; i < parts.length; i++) {
            int eq = parts[i].indexOf('=');
            if (eq <= 0) {
                throw new IllegalArgumentException("field '" + parts[i] + "' is not key=value");
            }
            fields.put(parts[i].substring(0, eq), unescape(parts[i].substring(eq + 1)));
        }
        return new JournalLine(parts[0], fields);
    }

    /** @return the CRC-32 (ISO-HDLC, as {@link CRC32}) of the bytes as eight upper-case hex digits */
    static String crcHex(byte[] bytes) {
        CRC32 crc = new CRC32();
        crc.update(bytes);
        return String.format(Locale.ROOT, "%08X", crc.getValue());
    }

    /** Percent-encodes every UTF-8 byte outside letters, digits and {@code . _ , : + - /}. */
    static String escape(String value) {
        StringBuilder out = new StringBuilder();
        for (byte b : value.getBytes(StandardCharsets.UTF_8)) {
            int c = b & 0xFF;
            if ((c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z') || (c >= '0' && c <= '9') || ".,_:+-/".indexOf(c) >= 0) {
                out.append((char) c);
            } else {
                out.append('%').append(String.format(Locale.ROOT, "%02X", c));
            }
        }
        return out.toString();
    }

    static String unescape(String value) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        for (int i = 0; i < value.length(); i++) {
            char c = value.charAt(i);
            if (c == '%') {
                if (i + 2 >= value.length()) {
                    throw new IllegalArgumentException("'" + value + "' ends inside a %XX escape");
                }
                out.write(Integer.parseInt(value.substring(i + 1, i + 3), 16));
                i += 2;
            } else {
                out.write(c);
            }
        }
        return out.toString(StandardCharsets.UTF_8);
    }

    /**
     * @param key a field
     * @return its value
     * @throws IllegalArgumentException when the record has no such field
     */
    String text(String key) {
        String value = fields.get(key);
        if (value == null) {
            throw new IllegalArgumentException(type + " record has no field '" + key + "'");
        }
        return value;
    }

    double number(String key) {
        try {
            return Double.parseDouble(text(key));
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(type + " field '" + key + "' is not a number: '" + text(key) + "'", e);
        }
    }

    long whole(String key) {
        try {
            return Long.parseLong(text(key));
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(type + " field '" + key + "' is not a whole number: '" + text(key) + "'", e);
        }
    }
}
