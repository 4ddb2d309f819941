package org.tautline.app.trace;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import java.util.Optional;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.analysis.AnalysisException;

/** The rig file and the run's setup: read whole, refused with the file, the field and what was expected. */
class RigFileTest {
    @TempDir
    Path dir;

    private Path file(String json) throws Exception {
        Path f = dir.resolve("rig.json");
        Files.writeString(f, json);
        return f;
    }

    private String refusal(String json) throws Exception {
        Path f = file(json);
        return assertThrows(AnalysisException.class, () -> RigFile.read(f)).getMessage();
    }

    @Test
    void readsARigAndLeavesOutWhatIsNotGiven() throws Exception {
        RigDescription rig = RigFile.read(file("{\"name\": \"bench 2\", \"instruments\": [{\"role\": \"force sensor\","
                + " \"serial\": \"FS-1\", \"calibrationDue\": \"2027-01-31\"}, {\"role\": \"amplifier\"}]}"));
        assertEquals("bench 2", rig.name());
        Instrument force = rig.instruments().get(0);
        assertEquals(Optional.of("FS-1"), force.serial());
        assertEquals(Optional.empty(), force.model(), "a model not given stays absent, never made up");
        assertEquals(Optional.of(LocalDate.of(2027, 1, 31)), force.calibrationDue());
        assertTrue(force.calibrationExpiredOn(LocalDate.of(2027, 2, 1)), "due the day before: expired");
        assertTrue(!force.calibrationExpiredOn(LocalDate.of(2027, 1, 31)), "due that day: still valid");
        assertTrue(!rig.instruments().get(1).calibrationExpiredOn(LocalDate.of(2100, 1, 1)), "no due date: not judged");
    }

    @Test
    void refusesAnUnknownFieldANullAWrongTypeAndABadDateNamingTheFileAndField() throws Exception {
        String where = dir.resolve("rig.json").toString();
        assertEquals(where + ", instruments[0]: field \"serialNo\" is not one this file may hold; expected only role, model,"
                + " serial, calibrationCertificate, calibrationDue", refusal("{\"name\": \"b\", \"instruments\": [{\"role\":"
                + " \"force sensor\", \"serialNo\": \"1\"}]}"));
        assertEquals(where + ", instruments[0]: field \"serial\" is null; leave the field out when it is not known (it is"
                + " then reported as not given)", refusal("{\"name\": \"b\", \"instruments\": [{\"role\": \"f\", \"serial\":"
                + " null}]}"));
        assertEquals(where + ", instruments[0]: field \"serial\" holds 1234; expected text",
                refusal("{\"name\": \"b\", \"instruments\": [{\"role\": \"f\", \"serial\": 1234}]}"));
        assertEquals(where + ", instruments[0]: field \"calibrationDue\" holds \"31.01.2027\"; expected a date as YYYY-MM-DD"
                + " (ISO 8601), for example 2027-03-31", refusal("{\"name\": \"b\", \"instruments\": [{\"role\": \"f\","
                + " \"calibrationDue\": \"31.01.2027\"}]}"));
        assertEquals(where + ": field \"name\" is missing; expected text", refusal("{\"instruments\": []}"));
        assertEquals(where + ": field \"instruments\" must be an array of objects", refusal("{\"name\": \"b\"}"));
    }

    @Test
    void aRunSetupIsWrittenAndReadBackWhole() throws Exception {
        RunSetup setup = new RunSetup(Optional.of(Instant.parse("2026-11-02T09:14:00Z")), OptionalDouble.of(21.5),
                OptionalDouble.of(45), Optional.of(RigFile.read(file("{\"name\": \"bench 2\", \"instruments\":"
                + " [{\"role\": \"force sensor\", \"model\": \"FS-10\", \"serial\": \"FS-1\", \"calibrationCertificate\":"
                + " \"CAL-1\", \"calibrationDue\": \"2027-01-31\"}]}"))));
        SetupFile.write(dir, setup);
        assertEquals(setup, SetupFile.read(dir), "what is recorded is read back unchanged");
        assertThrows(AnalysisException.class, () -> SetupFile.write(dir, RunSetup.NONE), "a recorded setup is kept");
        assertEquals(RunSetup.NONE, SetupFile.read(dir.resolve("nothing-here")), "no setup.json: nothing given");
    }

    @Test
    void refusesAHumidityOutsideZeroToAHundred() {
        AnalysisException e = assertThrows(AnalysisException.class, () -> new RunSetup(Optional.empty(),
                OptionalDouble.empty(), OptionalDouble.of(120), Optional.empty()));
        assertEquals("relative humidity 120.0 %; expected 0 to 100 %", e.getMessage());
    }
}
