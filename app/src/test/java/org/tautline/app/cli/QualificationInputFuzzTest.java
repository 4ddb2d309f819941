package org.tautline.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Base64;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.function.UnaryOperator;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.FrfCsvWriter;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.verdict.Figure;
import org.tautline.analysis.verdict.Limit;
import org.tautline.analysis.verdict.Specification;
import org.tautline.app.qualify.SpecificationFile;
import org.tautline.app.qualify.SpecimenFile;
import org.tautline.app.ui.results.SyntheticWire;

/**
 * Mutated specification and specimen files, fed to {@code fit} as a user would: every mutation is either refused with
 * a message that names the file (and nothing else escapes), or read as the same specification or specimen, so the
 * verdict is the original's. A mutation can never change a verdict silently.
 *
 * <p>Two kinds: named mutations of the sort people make (a dropped or null uncertainty, a misspelt figure, a unit in
 * another spelling, a duplicate limit, a null bound, an unknown field, a non-UTF-8 byte, CRLF line ends, a
 * byte-order mark), each run through the whole command with its expected outcome; and seeded random byte mutations
 * (flips, cuts, insertions of JSON tokens), read by the file readers, whose accepted results must be
 * complete: every limit a known figure in its own unit, every stated value with its uncertainty.
 *
 * <p>The FRF is the invented synthetic wire of the results tests (textbook modal sum), written as an FRF CSV.
 */
class QualificationInputFuzzTest {
    private static final int RANDOM_MUTATIONS = 2000;
    private static final String SPEC = """
            {
              "name": "fuzz wire limits (invented)",
              "revision": "B",
              "limits": [
                {"name": "fundamental frequency", "figure": "f1Hz", "unit": "Hz", "lower": 200.0, "upper": 260.0},
                {"name": "tension", "figure": "tensionN", "unit": "N", "lower": 140.0, "upper": 160.0},
                {"name": "bending stiffness", "figure": "bendingStiffnessNm2", "unit": "N m^2", "lower": 0.0, "upper": 0.01},
                {"name": "damping of the fundamental", "figure": "dampingRatio1", "unit": "", "lower": 0.001, "upper": 0.01},
                {"name": "stinger position", "figure": "forcingPositionM", "unit": "m", "lower": 0.05, "upper": 0.09}
              ]
            }
            """;
    private static final String SPECIMEN = """
            {
              "id": "SYNTH-1 (invented)",
              "lengthM": 0.6,
              "ends": "pinned",
              "linearDensityKgPerM": 0.002,
              "linearDensityStdKgPerM": 2.0e-5,
              "bendingStiffnessNm2": 6.14e-4,
              "bendingStiffnessStdNm2": 6.14e-5,
              "forcingPositionM": 0.07,
              "sensorPositionM": 0.43,
              "nominalTensionN": 150.0
            }
            """;
    private static final List<String> JSON_TOKENS = List.of("{", "}", "[", "]", ",", ":", "\"", "null", "true", "false",
            "-", "0", "1e999", "-0", "NaN", "Infinity", "\"not evaluated\"", "\r\n", "\n", " ", "\t", "\\u0000", "\\",
            "\"lower\": 1,", "\"upper\": null,", "\"unit\": \"N\",", "\"figure\": \"tensionn\",", "//", "/*",
            "\u00e9", "\ufeff");
    private static final byte[][] RAW_BYTES = {{(byte) 0xe9}, {(byte) 0xff}, {(byte) 0xc3}, {(byte) 0xef, (byte) 0xbb,
            (byte) 0xbf}, {0}};

    @TempDir
    static Path dir;
    private static Path frf;
    private static JsonNode baseline;
    private static Specification baselineSpecification;
    private static Specimen baselineSpecimen;

    @BeforeAll
    static void fitTheOriginalFiles() throws IOException {
        frf = dir.resolve("frf.csv");
        FrfCsvWriter.write(SyntheticWire.receptance(), Map.of("specimen", "SYNTH-1 (invented)"), frf);
        Path spec = write("spec.json", SPEC);
        Path specimen = write("specimen.json", SPECIMEN);
        baselineSpecification = SpecificationFile.read(spec);
        baselineSpecimen = SpecimenFile.read(specimen);
        CliRun run = fit(spec, specimen);
        assertEquals(0, run.exitCode(), "the original files pass: " + run.out() + run.err());
        baseline = ResultJson.MAPPER.readTree(run.out()).get("verdict");
        assertEquals("PASS", baseline.get("outcome").asText(), baseline.toString());
    }

    private static Path write(String name, String text) throws IOException {
        return write(name, text.getBytes(StandardCharsets.UTF_8));
    }

    private static Path write(String name, byte[] bytes) throws IOException {
        Path file = dir.resolve(name);
        Files.write(file, bytes);
        return file;
    }

    private static CliRun fit(Path spec, Path specimen) {
        return CliRun.of("fit", "--frf", frf.toString(), "--specimen", specimen.toString(), "--spec", spec.toString(),
                "--json");
    }

    /** A named mutation: what it does to the file's text, and whether it must be refused. */
    private record Mutation(String name, UnaryOperator<String> change, boolean refused) {
    }

    private static Mutation refused(String name, String from, String to) {
        return new Mutation(name, text -> replaceOnce(text, from, to), true);
    }

    private static Mutation same(String name, UnaryOperator<String> change) {
        return new Mutation(name, change, false);
    }

    private static String replaceOnce(String text, String from, String to) {
        int at = text.indexOf(from);
        if (at < 0) {
            throw new AssertionError("the mutation's text is not in the file: " + from);
        }
        return text.substring(0, at) + to + text.substring(at + from.length());
    }

    private static String compact(String text) {
        return text.replaceAll("\\n\\s*", "");
    }

    private static final List<Mutation> SPEC_MUTATIONS = List.of(
            refused("misspelt figure", "\"tensionN\"", "\"tensionn\""),
            refused("unknown figure", "\"forcingPositionM\"", "\"breakingLoadN\""),
            refused("wrong unit", "\"unit\": \"N\"", "\"unit\": \"kN\""),
            refused("unit of another figure", "\"unit\": \"Hz\"", "\"unit\": \"rad/s\""),
            refused("duplicate limit", "\"limits\": [", "\"limits\": [\n    {\"name\": \"f1 again\", \"figure\": \"f1Hz\","
                    + " \"unit\": \"Hz\", \"lower\": 100.0},"),
            refused("null bound", "\"upper\": 160.0", "\"upper\": null"),
            refused("bound as text", "\"upper\": 160.0", "\"upper\": \"160\""),
            refused("misspelt bound", "\"upper\": 160.0", "\"uper\": 160.0"),
            refused("unknown top-level field", "\"revision\": \"B\",", "\"revision\": \"B\", \"approvedBy\": \"QA\","),
            refused("duplicate field", "\"lower\": 140.0,", "\"lower\": 140.0, \"lower\": 100.0,"),
            refused("NaN bound", "\"lower\": 140.0", "\"lower\": NaN"),
            refused("bound beyond a double", "\"lower\": 140.0", "\"lower\": 1e999"),
            refused("no limits", "\"limits\": [", "\"limitz\": ["),
            new Mutation("text after the object", t -> t + "{}\n", true),
            same("unit with a superscript", t -> replaceOnce(t, "\"N m^2\"", "\"N m²\"")),
            same("unit with a middle dot", t -> replaceOnce(t, "\"N m^2\"", "\"N·m²\"")),
            same("dimensionless unit written 1", t -> replaceOnce(t, "\"figure\": \"dampingRatio1\", \"unit\": \"\"",
                    "\"figure\": \"dampingRatio1\", \"unit\": \"1\"")),
            same("CRLF line ends", t -> t.replace("\n", "\r\n")),
            same("byte-order mark", t -> "\ufeff" + t),
            same("one line", QualificationInputFuzzTest::compact),
            same("exponent notation", t -> replaceOnce(t, "\"upper\": 160.0", "\"upper\": 1.6e2")));

    private static final List<Mutation> SPECIMEN_MUTATIONS = List.of(
            refused("dropped mass uncertainty", "\"linearDensityStdKgPerM\": 2.0e-5,\n", ""),
            refused("null mass uncertainty", "\"linearDensityStdKgPerM\": 2.0e-5", "\"linearDensityStdKgPerM\": null"),
            refused("dropped stiffness uncertainty", "\"bendingStiffnessStdNm2\": 6.14e-5,\n", ""),
            refused("uncertainty in words", "2.0e-5", "\"about one percent\""),
            refused("misspelt field", "\"linearDensityStdKgPerM\"", "\"linearDensityStdKgPerm\""),
            refused("null length", "\"lengthM\": 0.6", "\"lengthM\": null"),
            refused("length as text", "\"lengthM\": 0.6", "\"lengthM\": \"0.6 m\""),
            refused("negative length", "\"lengthM\": 0.6", "\"lengthM\": -0.6"),
            refused("unknown end condition", "\"pinned\"", "\"glued\""),
            refused("duplicate field", "\"lengthM\": 0.6,", "\"lengthM\": 0.6, \"lengthM\": 0.7,"),
            refused("stinger beyond the span", "\"forcingPositionM\": 0.07", "\"forcingPositionM\": 0.7"),
            refused("array instead of object", "{", "[{"),
            same("CRLF line ends", t -> t.replace("\n", "\r\n")),
            same("byte-order mark", t -> "\ufeff" + t),
            same("one line", QualificationInputFuzzTest::compact),
            same("end condition in capitals", t -> replaceOnce(t, "\"pinned\"", "\"Pinned\"")),
            same("fields in another order", t -> replaceOnce(replaceOnce(t, "  \"lengthM\": 0.6,\n", ""),
                    "\"nominalTensionN\": 150.0", "\"nominalTensionN\": 150.0,\n  \"lengthM\": 0.6")));

    @Test
    void namedSpecificationMutationsAreRefusedNamingTheFileOrGiveTheSameVerdict() throws IOException {
        Path specimen = write("specimen.json", SPECIMEN);
        for (Mutation m : SPEC_MUTATIONS) {
            Path spec = write("spec-mutated.json", m.change().apply(SPEC));
            checkRun(m, spec, fit(spec, specimen));
        }
    }

    @Test
    void namedSpecimenMutationsAreRefusedNamingTheFileOrGiveTheSameVerdict() throws IOException {
        Path spec = write("spec.json", SPEC);
        for (Mutation m : SPECIMEN_MUTATIONS) {
            Path specimen = write("specimen-mutated.json", m.change().apply(SPECIMEN));
            checkRun(m, specimen, fit(spec, specimen));
        }
    }

    private static void checkRun(Mutation m, Path mutated, CliRun run) throws IOException {
        if (m.refused()) {
            assertEquals(1, run.exitCode(), m.name() + ": refused as an error; printed " + run.out() + run.err());
            assertTrue(run.err().startsWith("tautline: " + mutated), m.name() + ": the message names the file: "
                    + run.err());
            assertFalse(run.err().contains("Exception") || run.err().contains("com.fasterxml"), m.name()
                    + ": no program internals reach the user: " + run.err());
            assertEquals("", run.out(), m.name() + ": no result printed");
        } else {
            assertEquals(0, run.exitCode(), m.name() + ": " + run.err());
            assertEquals(baseline, ResultJson.MAPPER.readTree(run.out()).get("verdict"), m.name() + ": the same verdict");
        }
    }

    @Test
    void aNonUtf8ByteIsRefusedWithItsLineAndOffset() throws IOException {
        for (byte[] raw : new byte[][] {{(byte) 0xe9}, {(byte) 0xff}, {(byte) 0xc3, '"'}}) {
            byte[] text = SPEC.getBytes(StandardCharsets.UTF_8);
            int at = SPEC.indexOf("limits\"");
            byte[] bytes = splice(text, at + 3, at + 3, raw);
            Path spec = write("spec-latin1.json", bytes);
            CliRun run = fit(spec, write("specimen.json", SPECIMEN));
            assertEquals(1, run.exitCode(), run.err());
            assertTrue(run.err().startsWith("tautline: " + spec + ", line 4, byte offset " + (at + 3)), run.err());
            assertTrue(run.err().contains("not UTF-8"), run.err());
        }
    }

    @Test
    void anUncertaintyDeclaredNotEvaluatedNeverPasses() throws IOException {
        Path spec = write("spec.json", SPEC);
        Path specimen = write("specimen-unknown.json", replaceOnce(SPECIMEN, "2.0e-5", "\"not evaluated\""));
        CliRun run = fit(spec, specimen);
        assertEquals(11, run.exitCode(), run.out() + run.err());
        JsonNode verdict = ResultJson.MAPPER.readTree(run.out()).get("verdict");
        assertEquals("NOT_DETERMINABLE", verdict.get("outcome").asText(), verdict.toString());
        JsonNode tension = null;
        for (JsonNode limit : verdict.get("limits")) {
            if (limit.get("figure").asText().equals("tensionN")) {
                tension = limit;
            }
        }
        assertNotEquals(null, tension, verdict.toString());
        assertEquals("NOT_DETERMINABLE", tension.get("outcome").asText(), tension.toString());
    }

    @Test
    void randomSpecificationMutationsAreRefusedNamingTheFileOrReadWhole() throws IOException {
        Random random = new Random(20261204L);
        byte[] original = SPEC.getBytes(StandardCharsets.UTF_8);
        Path file = dir.resolve("spec-random.json");
        int refusedCount = 0;
        for (int i = 0; i < RANDOM_MUTATIONS; i++) {
            byte[] bytes = mutate(random, original);
            Files.write(file, bytes);
            try {
                Specification read = SpecificationFile.read(file);
                if (!read.equals(baselineSpecification)) {
                    for (Limit limit : read.limits()) {
                        Figure figure = Figure.byKey(limit.figureKey()).orElseThrow(() -> new AssertionError(
                                "accepted an unknown figure " + limit.figureKey() + " from " + show(bytes)));
                        assertEquals(figure.unit(), limit.unit(), "a limit in the figure's own unit, from " + show(bytes));
                        assertFalse(Double.isNaN(limit.lowerBound()) && Double.isNaN(limit.upperBound()),
                                "a limit with a bound, from " + show(bytes));
                    }
                }
            } catch (AnalysisException e) {
                refusedCount++;
                placed(file, e, bytes);
            } catch (RuntimeException | IOException e) {
                throw new AssertionError("mutation " + i + " let " + e + " escape; input " + show(bytes), e);
            }
        }
        assertTrue(refusedCount > RANDOM_MUTATIONS / 2, "most mutations are refused, got " + refusedCount);
    }

    @Test
    void randomSpecimenMutationsAreRefusedNamingTheFileOrReadWithEveryUncertainty() throws IOException {
        Random random = new Random(20261205L);
        byte[] original = SPECIMEN.getBytes(StandardCharsets.UTF_8);
        Path file = dir.resolve("specimen-random.json");
        int refusedCount = 0;
        for (int i = 0; i < RANDOM_MUTATIONS; i++) {
            byte[] bytes = mutate(random, original);
            Files.write(file, bytes);
            String text = new String(bytes, StandardCharsets.UTF_8);
            try {
                Specimen read = SpecimenFile.read(file);
                if (!read.equals(baselineSpecimen)) {
                    // A stated value is only ever read together with its uncertainty (no material is named here).
                    assertTrue(text.contains("\"linearDensityStdKgPerM\""), "mass per length without its uncertainty"
                            + " accepted from " + show(bytes));
                    assertTrue(!text.contains("\"bendingStiffnessNm2\"") || text.contains("\"bendingStiffnessStdNm2\""),
                            "bending stiffness without its uncertainty accepted from " + show(bytes));
                    assertTrue(Double.isNaN(read.linearDensityStdKgPerM()) || read.linearDensityStdKgPerM() >= 0,
                            "a mass uncertainty of " + read.linearDensityStdKgPerM() + " from " + show(bytes));
                }
            } catch (AnalysisException e) {
                refusedCount++;
                placed(file, e, bytes);
            } catch (RuntimeException | IOException e) {
                throw new AssertionError("mutation " + i + " let " + e + " escape; input " + show(bytes), e);
            }
        }
        assertTrue(refusedCount > RANDOM_MUTATIONS / 2, "most mutations are refused, got " + refusedCount);
    }

    private static void placed(Path file, AnalysisException e, byte[] bytes) {
        String message = e.getMessage();
        if (message == null || !message.startsWith(file.toString()) || message.contains("Exception")
                || message.contains("com.fasterxml")) {
            fail("the message must name the file and nothing internal: " + message + "; input " + show(bytes));
        }
    }

    private static String show(byte[] bytes) {
        return Base64.getEncoder().encodeToString(bytes);
    }

    /** One to three changes: a byte flipped, a span cut or repeated, a JSON token or a raw byte put in, the end cut. */
    private static byte[] mutate(Random random, byte[] file) {
        byte[] out = file;
        for (int count = 1 + random.nextInt(3); count > 0; count--) {
            int n = out.length;
            int at = random.nextInt(n + 1);
            int end = Math.min(n, at + random.nextInt(Math.max(1, n / 8)));
            out = switch (random.nextInt(6)) {
                case 0 -> {
                    byte[] flipped = out.clone();
                    if (n > 0) {
                        flipped[random.nextInt(n)] ^= (byte) (1 << random.nextInt(8));
                    }
                    yield flipped;
                }
                case 1 -> splice(out, at, end, new byte[0]);
                case 2 -> splice(out, at, at, java.util.Arrays.copyOfRange(out, at, end));
                case 3 -> splice(out, at, at, JSON_TOKENS.get(random.nextInt(JSON_TOKENS.size()))
                        .getBytes(StandardCharsets.UTF_8));
                case 4 -> splice(out, at, at, RAW_BYTES[random.nextInt(RAW_BYTES.length)]);
                default -> java.util.Arrays.copyOf(out, at);
            };
        }
        return out;
    }

    private static byte[] splice(byte[] in, int from, int to, byte[] insert) {
        byte[] out = new byte[in.length - (to - from) + insert.length];
        System.arraycopy(in, 0, out, 0, from);
        System.arraycopy(insert, 0, out, from, insert.length);
        System.arraycopy(in, to, out, from + insert.length, in.length - to);
        return out;
    }
}
