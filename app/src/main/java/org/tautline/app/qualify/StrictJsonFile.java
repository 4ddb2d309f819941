package org.tautline.app.qualify;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import com.fasterxml.jackson.core.JacksonException;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.tautline.analysis.AnalysisException;

/**
 * Reads a file that must hold exactly one JSON object (RFC 8259), strictly: UTF-8 only, no duplicate field, nothing
 * after the object. Every refusal names the file, the line and column (or byte offset) and what was expected.
 */
final class StrictJsonFile {
    private static final ObjectMapper MAPPER = new ObjectMapper()
            .enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION);
    private static final Pattern DUPLICATE = Pattern.compile("^Duplicate (?:field|Object property) ['\"](.*)['\"]$");
    private static final Pattern NON_STANDARD = Pattern.compile("^Non-standard token '([^']*)'.*");
    private static final char BYTE_ORDER_MARK = '\uFEFF';

    private StrictJsonFile() {
    }

    /**
     * @param file the file
     * @param what what it describes, for messages ("specimen")
     * @return its root, an object
     * @throws AnalysisException when the file is absent, a folder, not UTF-8, not JSON or not one object
     * @throws IOException when the file cannot be read for another reason
     */
    static JsonNode readObject(Path file, String what) throws IOException {
        String expected = "expected a JSON file describing the " + what;
        if (!Files.exists(file, LinkOption.NOFOLLOW_LINKS)) {
            throw new AnalysisException(file + ": no such file; " + expected);
        }
        if (Files.isDirectory(file)) {
            throw new AnalysisException(file + ": a folder, not a file; " + expected);
        }
        if (!Files.exists(file)) {
            throw new AnalysisException(file + ": a link to nothing; " + expected);
        }
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (AccessDeniedException e) {
            throw new AnalysisException(file + ": cannot be read (permission denied); " + expected);
        }
        String objectExpected = "expected a JSON object describing the " + what;
        if (bytes.length == 0) {
            throw new AnalysisException(file + ": empty; " + objectExpected);
        }
        String text = decode(file, bytes);
        if (!text.isEmpty() && text.charAt(0) == BYTE_ORDER_MARK) {
            text = " " + text.substring(1); // a UTF-8 byte-order mark is allowed; a space keeps the columns
        }
        try (JsonParser parser = MAPPER.getFactory().createParser(text)) {
            JsonToken first = parser.nextToken();
            if (first == null) {
                throw new AnalysisException(file + ": holds only white space; " + objectExpected);
            }
            if (first != JsonToken.START_OBJECT) {
                throw new AnalysisException(at(file, parser.currentTokenLocation()) + kind(first) + "; " + objectExpected);
            }
            JsonNode root = MAPPER.readTree(parser);
            if (parser.nextToken() != null) {
                throw new AnalysisException(at(file, parser.currentTokenLocation()) + "more after the JSON object;"
                        + " expected the file to end after it");
            }
            return root;
        } catch (JacksonException e) {
            throw new AnalysisException(at(file, e.getLocation()) + plain(e.getOriginalMessage()));
        }
    }

    /** Decodes strictly: a byte that is not UTF-8 is named with its byte offset and line. */
    private static String decode(Path file, byte[] bytes) {
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        CharBuffer out = CharBuffer.allocate(bytes.length);
        CoderResult result = decoder.decode(in, out, true);
        if (!result.isError()) {
            result = decoder.flush(out);
        }
        if (result.isError()) {
            int offset = in.position();
            int line = 1;
            for (int i = 0; i < offset; i++) {
                line += bytes[i] == '\n' ? 1 : 0;
            }
            StringBuilder bad = new StringBuilder();
            for (int i = offset; i < Math.min(bytes.length, offset + result.length()); i++) {
                bad.append(bad.length() == 0 ? "" : " ").append(String.format(Locale.ROOT, "0x%02X", bytes[i] & 0xff));
            }
            throw new AnalysisException(file + ", line " + line + ", byte offset " + offset + ": " + bad
                    + (result.length() == 1 ? " is" : " are") + " not UTF-8; expected UTF-8 text");
        }
        out.flip();
        return out.toString();
    }

    private static String at(Path file, JsonLocation location) {
        return location == null || location.getLineNr() < 1 ? file + ": "
                : file + ", line " + location.getLineNr() + ", column " + location.getColumnNr() + ": ";
    }

    private static String kind(JsonToken token) {
        return switch (token) {
            case START_ARRAY -> "a JSON array";
            case VALUE_STRING -> "a JSON string";
            case VALUE_NUMBER_INT, VALUE_NUMBER_FLOAT -> "a JSON number";
            case VALUE_TRUE, VALUE_FALSE -> "a JSON true or false";
            case VALUE_NULL -> "JSON null";
            default -> "not a JSON object";
        };
    }

    /** The parser's message in plain words: no settings of the library, no internal source names. */
    private static String plain(String message) {
        String m = message == null ? "" : message;
        Matcher duplicate = DUPLICATE.matcher(m);
        if (duplicate.matches()) {
            return "field \"" + duplicate.group(1) + "\" appears twice; expected each field once";
        }
        Matcher nonStandard = NON_STANDARD.matcher(m);
        if (nonStandard.matches()) {
            return "not valid JSON: " + nonStandard.group(1) + " is not a JSON value; expected a finite number";
        }
        m = m.replaceAll("\\s*\\(start marker at \\[Source:[^\\]]*\\]\\)", "")
                .replaceAll(":? enable `[^`]*` to allow", "")
                .replaceAll(", from `[^`]*`", "")
                .replaceAll("\\s*\\(not recognized as one since Feature '[^']*' not enabled for parser\\)", "");
        return "not valid JSON: " + m;
    }
}
