package org.tautline.app.qualify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.specimen.EndCondition;
import org.tautline.analysis.specimen.Material;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.verdict.Specification;

class SpecimenFileTest {
    @TempDir
    Path dir;

    private Path write(String name, String json) throws IOException {
        Path file = dir.resolve(name);
        Files.writeString(file, json);
        return file;
    }

    @Test
    void readsAMaterialAndDiameterAsARoundWire() throws IOException {
        // mu = rho pi d^2/4 with music wire's 7850 kg/m^3 (material tables, checks.md).
        Specimen s = SpecimenFile.read(write("s.json", "{\"id\": \"W-1\", \"lengthM\": 1.0, \"ends\": \"clamped\","
                + " \"material\": \"music-wire\", \"diameterM\": 0.001, \"forcingPositionM\": 0.1, \"sensorPositionM\": 0.3,"
                + " \"nominalTensionN\": 500}"));
        assertEquals(EndCondition.CLAMPED, s.ends());
        assertEquals(Material.MUSIC_WIRE, s.material().orElseThrow());
        assertEquals(6.1654e-3, s.linearDensityKgPerM(), 1e-7, "checks.md check case mu");
        assertTrue(s.bendingStiffnessNm2() > 0);
    }

    @Test
    void explicitValuesOverrideTheMaterial() throws IOException {
        Specimen s = SpecimenFile.read(write("s.json", "{\"id\": \"W-2\", \"lengthM\": 0.6, \"ends\": \"pinned\","
                + " \"linearDensityKgPerM\": 0.002, \"linearDensityStdKgPerM\": 0.00002, \"bendingStiffnessNm2\": 6e-4,"
                + " \"bendingStiffnessStdNm2\": 6e-5, \"forcingPositionM\": 0.07, \"sensorPositionM\": 0.43, \"nominalTensionN\": 150, \"sensorAngleDeg\": 90}"));
        assertEquals(0.002, s.linearDensityKgPerM(), 0.0);
        assertEquals(2e-5, s.linearDensityStdKgPerM(), 0.0);
        assertEquals(Math.PI / 2, s.sensorAngleRad(), 1e-12);
    }

    @Test
    void namesTheFileAndTheMissingField() throws IOException {
        Path file = write("s.json", "{\"id\": \"W-3\", \"ends\": \"pinned\"}");
        AnalysisException e = assertThrows(AnalysisException.class, () -> SpecimenFile.read(file));
        assertEquals(file + ": field \"lengthM\" is missing; expected a number", e.getMessage());
    }

    @Test
    void namesAnUnknownEndCondition() throws IOException {
        Path file = write("s.json", "{\"id\": \"W-4\", \"lengthM\": 1, \"ends\": \"glued\"}");
        AnalysisException e = assertThrows(AnalysisException.class, () -> SpecimenFile.read(file));
        assertEquals(file + ": field \"ends\" holds 'glued'; expected pinned or clamped", e.getMessage());
    }

    @Test
    void namesAnUnknownMaterialAndListsTheKnownOnes() throws IOException {
        Path file = write("s.json", "{\"id\": \"W-5\", \"lengthM\": 1, \"ends\": \"pinned\", \"material\": \"unobtainium\","
                + " \"diameterM\": 0.001, \"forcingPositionM\": 0.1, \"sensorPositionM\": 0.3, \"nominalTensionN\": 100}");
        AnalysisException e = assertThrows(AnalysisException.class, () -> SpecimenFile.read(file));
        assertEquals(file + ": field \"material\" holds 'unobtainium'; expected one of music-wire, stainless-302-304,"
                + " nylon-66, pet, para-aramid", e.getMessage());
    }

    @Test
    void passesOnTheSpecimensOwnCheckWithTheFileName() throws IOException {
        Path file = write("s.json", "{\"id\": \"W-6\", \"lengthM\": 1.0, \"ends\": \"pinned\", \"linearDensityKgPerM\": 0.001,"
                + " \"linearDensityStdKgPerM\": 0.00001, \"forcingPositionM\": 1.2, \"sensorPositionM\": 0.3, \"nominalTensionN\": 100}");
        AnalysisException e = assertThrows(AnalysisException.class, () -> SpecimenFile.read(file));
        assertEquals(file + ": specimen forcingPositionM must lie strictly inside the span, 0 < x < 1.0 m, got 1.2 m",
                e.getMessage());
    }

    private static final String STATED = "{\"id\": \"W-7\", \"lengthM\": 0.6, \"ends\": \"pinned\","
            + " \"linearDensityKgPerM\": 0.002, %s \"forcingPositionM\": 0.07, \"sensorPositionM\": 0.43,"
            + " \"nominalTensionN\": 150}";

    @Test
    void aStatedValueWithoutItsUncertaintyIsRefusedNeverTakenAsZero() throws IOException {
        Path missing = write("s.json", String.format(STATED, ""));
        AnalysisException e = assertThrows(AnalysisException.class, () -> SpecimenFile.read(missing));
        assertEquals(missing + ": field \"linearDensityKgPerM\" is stated without its uncertainty; expected"
                + " \"linearDensityStdKgPerM\": a standard uncertainty (0 or more), or \"not evaluated\"", e.getMessage());
        Path nulled = write("n.json", String.format(STATED, "\"linearDensityStdKgPerM\": null,"));
        e = assertThrows(AnalysisException.class, () -> SpecimenFile.read(nulled));
        assertEquals(nulled + ": field \"linearDensityStdKgPerM\" is null; expected a value, or leave the field out where"
                + " it is optional", e.getMessage());
        Path words = write("w.json", String.format(STATED, "\"linearDensityStdKgPerM\": \"small\","));
        e = assertThrows(AnalysisException.class, () -> SpecimenFile.read(words));
        assertEquals(words + ": field \"linearDensityStdKgPerM\" holds 'small'; expected a standard uncertainty (a number,"
                + " 0 or more) or \"not evaluated\"", e.getMessage());
        Specimen notEvaluated = SpecimenFile.read(write("ne.json", String.format(STATED,
                "\"linearDensityStdKgPerM\": \"not evaluated\",")));
        assertTrue(notEvaluated.linearDensityUncertaintyUnknown());
    }

    @Test
    void aFieldTheFormatDoesNotHaveIsRefused() throws IOException {
        Path file = write("s.json", String.format(STATED, "\"linearDensityStdKgPerM\": 0, \"lenghtM\": 0.6,"));
        AnalysisException e = assertThrows(AnalysisException.class, () -> SpecimenFile.read(file));
        assertTrue(e.getMessage().startsWith(file + ": field \"lenghtM\" is not one this file may hold; expected only id,"
                + " lengthM,"), e.getMessage());
    }

    private static final String LIMIT = "{\"name\": \"lot C\", \"limits\": [%s]}";
    private static final String TENSION = "{\"name\": \"tension\", \"figure\": \"tensionN\", \"unit\": \"N\","
            + " \"lower\": 140, \"upper\": 160}";

    @Test
    void aSpecificationIsCheckedWholeAgainstTheFiguresThatExist() throws IOException {
        Path misspelt = write("a.json", String.format(LIMIT, TENSION.replace("tensionN", "tensionn")));
        AnalysisException e = assertThrows(AnalysisException.class, () -> SpecificationFile.read(misspelt));
        assertTrue(e.getMessage().startsWith(misspelt + ", limits[0]: figure 'tensionn' does not exist (did you mean"
                + " 'tensionN'?); expected one of f1Hz, tensionN,"), e.getMessage());
        Path unit = write("b.json", String.format(LIMIT, TENSION.replace("\"N\"", "\"kN\"")));
        e = assertThrows(AnalysisException.class, () -> SpecificationFile.read(unit));
        assertEquals(unit + ", limits[0]: unit 'kN' is not the unit of tensionN (tension); expected 'N'", e.getMessage());
        Path twice = write("c.json", String.format(LIMIT, TENSION + ", " + TENSION));
        e = assertThrows(AnalysisException.class, () -> SpecificationFile.read(twice));
        assertEquals(twice + ", limits[1]: figure tensionN is limited a second time; it was limited already at " + twice
                + ", limits[0] (one limit per figure, with both bounds)", e.getMessage());
        Path nulled = write("d.json", String.format(LIMIT, TENSION.replace("\"upper\": 160", "\"upper\": null")));
        e = assertThrows(AnalysisException.class, () -> SpecificationFile.read(nulled));
        assertEquals(nulled + ", limits[0]: field \"upper\" is null; expected a number, or leave the field out for no"
                + " upper bound", e.getMessage());
        Path extra = write("e.json", String.format(LIMIT, TENSION.replace("\"lower\"", "\"low\"")));
        e = assertThrows(AnalysisException.class, () -> SpecificationFile.read(extra));
        assertTrue(e.getMessage().startsWith(extra + ", limits[0]: field \"low\" is not one this file may hold"),
                e.getMessage());
    }

    @Test
    void aUnitMayBeWrittenTypographically() throws IOException {
        Specification spec = SpecificationFile.read(write("s.json", String.format(LIMIT, "{\"name\": \"EI\","
                + " \"figure\": \"bendingStiffnessNm2\", \"unit\": \"N m²\", \"upper\": 0.001}, {\"name\": \"B\","
                + " \"figure\": \"inharmonicityB\", \"unit\": \"1\", \"upper\": 0.001}")));
        assertEquals("N m^2", spec.limits().get(0).unit(), "kept in the figure's own spelling, so the verdict can judge it");
        assertEquals("", spec.limits().get(1).unit());
    }

    @Test
    void readsASpecificationAndNamesABadLimit() throws IOException {
        Specification spec = SpecificationFile.read(write("spec.json", "{\"name\": \"lot A\", \"limits\": ["
                + "{\"name\": \"tension\", \"figure\": \"tensionN\", \"unit\": \"N\", \"lower\": 140, \"upper\": 160},"
                + "{\"name\": \"damping\", \"figure\": \"dampingRatio1\", \"unit\": \"\", \"upper\": 0.01}]}"));
        assertEquals(2, spec.limits().size());
        assertTrue(Double.isNaN(spec.limits().get(1).lowerBound()));
        Path bad = write("bad.json", "{\"name\": \"lot B\", \"limits\": [{\"name\": \"t\", \"figure\": \"tensionN\","
                + " \"unit\": \"N\", \"lower\": 160, \"upper\": 140}]}");
        AnalysisException e = assertThrows(AnalysisException.class, () -> SpecificationFile.read(bad));
        assertTrue(e.getMessage().startsWith(bad + ", limits[0]: "), e.getMessage());
    }
}
