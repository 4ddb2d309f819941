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
                + " \"forcingPositionM\": 0.07, \"sensorPositionM\": 0.43, \"nominalTensionN\": 150, \"sensorAngleDeg\": 90}"));
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
                + " \"forcingPositionM\": 1.2, \"sensorPositionM\": 0.3, \"nominalTensionN\": 100}");
        AnalysisException e = assertThrows(AnalysisException.class, () -> SpecimenFile.read(file));
        assertEquals(file + ": specimen forcingPositionM must lie strictly inside the span, 0 < x < 1.0 m, got 1.2 m",
                e.getMessage());
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
