package org.tautline.app.qualify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.analysis.AnalysisException;

/** Reading JSON inputs strictly (RFC 8259 JSON in UTF-8, RFC 3629): every refusal names the file and the place. */
class JsonFieldsTest {
    @TempDir
    Path dir;

    private String refused(byte[] content) throws IOException {
        Path file = dir.resolve("in.json");
        Files.write(file, content);
        return assertThrows(AnalysisException.class, () -> JsonFields.read(file, "specimen")).getMessage()
                .replace(file.toString(), "FILE");
    }

    private String refused(String content) throws IOException {
        return refused(content.getBytes(StandardCharsets.UTF_8));
    }

    @Test
    void refusesBytesThatAreNotUtf8WithTheirLineAndOffset() throws IOException {
        // 0xE9 is e-acute in Latin-1; in UTF-8 it must start a three-byte sequence (RFC 3629, section 4).
        byte[] latin1 = "{\"id\": \"W-1\",\n \"name\": \"caf\u00e9\"}".getBytes(StandardCharsets.ISO_8859_1);
        assertEquals("FILE, line 2, byte offset 27: 0xE9 is not UTF-8; expected UTF-8 text", refused(latin1));
        byte[] surrogate = {'{', '"', 'a', '"', ':', '"', (byte) 0xED, (byte) 0xA0, (byte) 0x80, '"', '}'};
        assertEquals("FILE, line 1, byte offset 6: 0xED 0xA0 0x80 are not UTF-8; expected UTF-8 text", refused(surrogate),
                "an encoded UTF-16 surrogate is not UTF-8 (RFC 3629, section 3)");
        byte[] cutShort = {'{', '"', 'a', '"', ':', '"', (byte) 0xE2, (byte) 0x82};
        assertEquals("FILE, line 1, byte offset 6: 0xE2 0x82 are not UTF-8; expected UTF-8 text", refused(cutShort));
    }

    @Test
    void refusesWhatIsNotOneObjectNamingTheLineAndColumn() throws IOException {
        Map<String, String> cases = new LinkedHashMap<>();
        cases.put("", "FILE: empty; expected a JSON object describing the specimen");
        cases.put(" \n\t\n", "FILE: holds only white space; expected a JSON object describing the specimen");
        cases.put("\n  [1, 2]", "FILE, line 2, column 3: a JSON array; expected a JSON object describing the specimen");
        cases.put("\"W-1\"", "FILE, line 1, column 1: a JSON string; expected a JSON object describing the specimen");
        cases.put("null", "FILE, line 1, column 1: JSON null; expected a JSON object describing the specimen");
        cases.put("{\"lengthM\": 0.6,\n \"lengthM\": 0.7}", "FILE, line 2, column 11: field \"lengthM\" appears twice;"
                + " expected each field once");
        cases.put("{\"a\": 1}\n{\"a\": 2}", "FILE, line 2, column 1: more after the JSON object; expected the file to end"
                + " after it");
        cases.put("{\"a\": 1,\n}", "FILE, line 2, column 1: not valid JSON: Unexpected character ('}' (code 125)): was"
                + " expecting double-quote to start field name");
        cases.put("{\"a\": NaN}", "FILE, line 1, column 10: not valid JSON: NaN is not a JSON value; expected a finite"
                + " number");
        cases.put("{// note\n\"a\": 1}", "FILE, line 1, column 2: not valid JSON: Unexpected character ('/' (code 47)):"
                + " maybe a (non-standard) comment?");
        cases.put("{\"a\": +1}", "FILE, line 1, column 8: not valid JSON: Unexpected character ('+' (code 43)) in numeric"
                + " value: JSON spec does not allow numbers to have plus signs");
        cases.put("{\"a\": [1,\n 2", "FILE, line 2, column 3: not valid JSON: Unexpected end-of-input: expected close"
                + " marker for Array");
        for (Map.Entry<String, String> c : cases.entrySet()) {
            assertEquals(c.getValue(), refused(c.getKey()), c.getKey());
        }
    }

    @Test
    void refusesAFolderAndAnAbsentFile() throws IOException {
        Path folder = Files.createDirectory(dir.resolve("folder.json"));
        assertEquals(folder + ": a folder, not a file; expected a JSON file describing the specimen",
                assertThrows(AnalysisException.class, () -> JsonFields.read(folder, "specimen")).getMessage());
        Path absent = dir.resolve("absent.json");
        assertEquals(absent + ": no such file; expected a JSON file describing the specimen",
                assertThrows(AnalysisException.class, () -> JsonFields.read(absent, "specimen")).getMessage());
    }

    @Test
    void refusesANumberBeyondTheRangeOfADouble() throws IOException {
        Path file = dir.resolve("big.json");
        Files.writeString(file, "{\"lengthM\": 1e999, \"levels\": [1, 2e400]}");
        JsonFields json = JsonFields.read(file, "specimen");
        assertEquals(file + ": field \"lengthM\" holds a number beyond the range of a double (about 1.8e308); expected a"
                + " finite number", assertThrows(AnalysisException.class, () -> json.number("lengthM")).getMessage());
        assertEquals(file + ", levels[1] holds a number beyond the range of a double (about 1.8e308); expected a finite"
                + " number", assertThrows(AnalysisException.class, () -> json.numbers("levels")).getMessage());
    }

    @Test
    void acceptsAByteOrderMarkAndReadsTypedFields() throws IOException {
        Path file = dir.resolve("ok.json");
        Files.writeString(file, "\uFEFF{\"id\": \"W-1\", \"n\": 3, \"linear\": true, \"x\": 0.5, \"list\": [{\"k\": false}]}");
        JsonFields json = JsonFields.read(file, "specimen");
        assertEquals("W-1", json.text("id"));
        assertEquals(3, json.wholeNumber("n"));
        assertEquals(true, json.bool("linear"));
        assertEquals(0.5, json.number("x"));
        List<JsonFields> list = json.objects("list");
        assertEquals(false, list.get(0).bool("k"));
        assertEquals(file + ": field \"x\" holds 0.5; expected true or false",
                assertThrows(AnalysisException.class, () -> json.bool("x")).getMessage());
        assertEquals(file + ": field \"m\" is missing; expected a whole number",
                assertThrows(AnalysisException.class, () -> json.wholeNumber("m")).getMessage());
    }
}
