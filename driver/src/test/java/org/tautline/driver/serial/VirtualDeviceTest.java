package org.tautline.driver.serial;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.tautline.driver.RigLinkException;
import org.tautline.driver.sim.SimulatedRig;
import org.tautline.driver.spi.SampleBlock;

/** The virtual rig does what PROTOCOL.md says a device does. */
@Timeout(value = 60)
class VirtualDeviceTest {
    private static double[][] samples(RawHost host, int n, int blockSamples) {
        double[][] out = new double[2][n];
        for (int done = 0; done < n; done += blockSamples) {
            DataBlock b = host.block();
            for (int c = 0; c < 2; c++) {
                System.arraycopy(b.samples()[c], 0, out[c], done, b.sampleCount());
            }
        }
        return out;
    }

    @Test
    void aSineChangeFirstAffectsTheSampleAcqNextNamesAndARampSkipsItsSamples() {
        try (VirtualRigServer server = VirtualRigServer.startOnPty(RigScript.CONFIG, 921600);
             RawHost host = new RawHost(server);
             SimulatedRig sim = new SimulatedRig(RigScript.CONFIG)) {
            host.send("ACQ:FORM F64", "ACQ:BLOCK 256", "DRIVE:SINE 250,0", "DRIVE:OUT ON", "ACQ:FETCH? 300");
            samples(host, 300, 256);
            assertEquals("300", host.ask("ACQ:NEXT?"));
            host.send("DRIVE:SINE 250,1.0");
            assertEquals("300", host.ask("ACQ:NEXT?"), "the first sample the change affects");
            host.send("ACQ:FETCH? 512");
            double[][] got = samples(host, 512, 256);
            // The in-process rig applies a sine change from the next sample it computes (SimulatedRig).
            sim.exciter().setSine(250, 0.0);
            sim.exciter().setOutputEnabled(true);
            sim.acquisition().read(300);
            sim.exciter().setSine(250, 1.0);
            SampleBlock want = sim.acquisition().read(512);
            assertArrayEquals(want.samples()[0], got[0], "force from sample 300 on");
            assertArrayEquals(want.samples()[1], got[1], "response from sample 300 on");
            // A change one sample earlier gives other samples, so the comparison above can fail.
            try (SimulatedRig early = new SimulatedRig(RigScript.CONFIG)) {
                early.exciter().setSine(250, 0.0);
                early.exciter().setOutputEnabled(true);
                early.acquisition().read(299);
                early.exciter().setSine(250, 1.0);
                early.acquisition().read(1);
                assertFalse(Arrays.equals(early.acquisition().read(512).samples()[0], got[0]));
            }
            host.send("DRIVE:RAMP 0.5,0.01");
            // 0.01 s at 20 kS/s: 200 samples produced and not delivered.
            assertEquals("1012", host.ask("ACQ:NEXT?"));
            host.send("ACQ:FETCH? 10");
            assertEquals(1012, host.block().firstSampleIndex());
            host.send("DRIVE:OUT OFF");
        }
    }

    @Test
    void streamingDoesNotFeedTheWatchdogSoASilentHostTripsIt() throws InterruptedException {
        try (VirtualRigServer server = VirtualRigServer.startOnPty(RigScript.CONFIG, 921600);
             RawHost host = new RawHost(server)) {
            host.send("LINK:WDOG 200", "ACQ:BLOCK 64", "DRIVE:SINE 250,0.5", "DRIVE:OUT ON", "ACQ:STREAM ON");
            int blocks = 0;
            while (host.linkFault() == null) {
                if (host.inbox.poll(5) instanceof LinkEvent.Block) {
                    blocks++;
                }
            }
            RigLinkException notice = host.linkFault();
            assertEquals(RigLinkException.Kind.DEVICE_ERROR, notice.kind());
            assertTrue(notice.getMessage().contains("Watchdog expired after 200 ms: output switched off, fault 101"),
                    notice.getMessage());
            assertTrue(blocks >= 2, "the stream ran while the host was silent: " + blocks + " blocks");
            assertFalse(server.outputEnabled());
            host.send("ACQ:STREAM OFF");
            assertEquals(101, host.error());
        }
    }

    static Stream<Arguments> refusals() {
        return Stream.of(
                Arguments.of("", "ACQ:BOGUS?", -113),
                Arguments.of("", "ACQ:BOGUS", -113),
                Arguments.of("", "DRIVE:SINE 250", -109),
                Arguments.of("", "DRIVE:SINE 250,abc", -104),
                Arguments.of("", "DRIVE:SINE 250,50", -222),
                Arguments.of("", "DRIVE:SINE 10000,1", -222),
                Arguments.of("", "DRIVE:RAMP 1,-1", -222),
                Arguments.of("", "DRIVE:OUT MAYBE", -224),
                Arguments.of("", "DRIVE:OUT ON,1", -108),
                Arguments.of("", "*IDN? 1", -108),
                Arguments.of("", "ACQ:FORM X16", -224),
                Arguments.of("", "ACQ:BLOCK 1.5", -222),
                Arguments.of("", "LINK:WDOG 10", -222),
                Arguments.of("", "ACQ:RESEND? 99", 102),
                Arguments.of("ACQ:STREAM ON", "ACQ:FETCH? 10", -221),
                Arguments.of("", "LINK:FEED" + " ".repeat(StreamDecoder.MAX_LINE_BYTES), -363));
    }

    @ParameterizedTest
    @MethodSource("refusals")
    void eachRefusalHasTheCodeOfTheTableAndAQueryIsAnsweredByErrInsteadOfQueued(String setup, String command,
                                                                                   int code) {
        try (VirtualRigServer server = VirtualRigServer.startOnPty(RigScript.CONFIG, 921600);
             RawHost host = new RawHost(server)) {
            if (!setup.isEmpty()) {
                host.send(setup);
            }
            host.send(command);
            boolean query = command.contains("?");
            if (query) {
                String reply = host.reply();
                assertTrue(reply.startsWith("!ERR " + code + ",\""), command + " answered " + reply);
            }
            host.send("ACQ:STREAM OFF");
            assertEquals(query ? "0" : "1", host.ask("SYST:ERR:COUNT?"), "queued only when it is not a query");
            if (!query) {
                assertEquals(code, host.error(), command);
            }
        }
    }

    @Test
    void aLineOfTheLongestAllowedLengthIsReadAndAQuoteInAMessageIsDoubled() {
        try (VirtualRigServer server = VirtualRigServer.startOnPty(RigScript.CONFIG, 921600);
             RawHost host = new RawHost(server)) {
            String longest = "LINK:FEED" + " ".repeat(StreamDecoder.MAX_LINE_BYTES - 9);
            host.send(longest);
            assertEquals("0", host.ask("SYST:ERR:COUNT?"), "a line of " + longest.length() + " bytes is allowed");
            String reply = host.ask("A\"B?");
            assertEquals("!ERR -113,\"Undefined header; A\"\"B?\"", reply);
            assertEquals("Undefined header; A\"B?", DeviceError.parse(reply.substring(5)).message());
        }
    }

    @Test
    void starRstKeepsTheClockAndTheCounterButAResetForgetsEverything() {
        try (VirtualRigServer server = VirtualRigServer.startOnPty(RigScript.CONFIG, 921600);
             RawHost host = new RawHost(server)) {
            host.send("LINK:WDOG 700", "ACQ:FORM F64", "ACQ:BLOCK 100", "DRIVE:SINE 250,0.5", "DRIVE:OUT ON",
                    "ACQ:FETCH? 150");
            host.block();
            host.block();
            host.send("*RST");
            assertEquals("0", host.ask("DRIVE:OUT?"));
            assertEquals("F32", host.ask("ACQ:FORM?"));
            assertEquals("1024", host.ask("ACQ:BLOCK?"));
            assertEquals("0.0", host.ask("DRIVE:AMPL?"));
            assertEquals("250.0", host.ask("DRIVE:FREQ?"));
            assertEquals("700", host.ask("LINK:WDOG?"), "*RST keeps the watchdog time");
            assertEquals("150", host.ask("ACQ:NEXT?"), "*RST keeps the sample clock");
            assertEquals("2", host.ask("ACQ:SEQ?"), "*RST keeps the sequence numbers");
            assertEquals("0", host.ask("LINK:BOOT?"));
            server.reset();
            assertEquals("1", host.ask("LINK:BOOT?"));
            assertNotNull(host.linkFault(), "the !RESET notice arrived");
            assertEquals(RigLinkException.Kind.DEVICE_RESET, host.linkFault().kind());
            assertEquals("0", host.ask("ACQ:NEXT?"));
            assertEquals("0", host.ask("ACQ:SEQ?"));
            assertEquals("2000", host.ask("LINK:WDOG?"));
        }
    }

    @Test
    void aStatusOvertakesTheBlocksOfAFetchAndAbortEndsTheFetch() {
        VirtualRigSettings paced = VirtualRigSettings.of(921600).withPacing(true);
        try (VirtualRigServer server = VirtualRigServer.startOnPty(RigScript.CONFIG, paced);
             RawHost host = new RawHost(server)) {
            host.send("ACQ:FORM F64", "ACQ:BLOCK 256", "ACQ:FETCH? 8192");
            assertEquals(0, host.block().sequence());
            host.send("DRIVE:SINE 250,0.5", "LINK:STAT? 7");
            LinkEvent e;
            int blocksBefore = 0;
            while (!((e = host.next()) instanceof LinkEvent.Status)) {
                blocksBefore++;
            }
            DeviceStatus s = ((LinkEvent.Status) e).status();
            assertEquals(7, s.tag());
            assertTrue(blocksBefore < 31, "the status came before the fetch's last block: after " + blocksBefore);
            assertEquals(8192, s.nextSample(), "the next fetch starts after this one");
            assertEquals(32, s.nextSequence());
            assertEquals(1, s.errorCount(), "a sine change during a fetch is refused");
            host.send("ACQ:ABORT", "LINK:STAT? 8");
            while (!((e = host.next()) instanceof LinkEvent.Status)) {
                blocksBefore++;
            }
            assertTrue(blocksBefore < 31, "the abort ended the fetch: " + blocksBefore + " blocks in all");
            long next = ((LinkEvent.Status) e).status().nextSample();
            assertEquals(256 * (blocksBefore + 1), next, "the samples of the blocks not sent were never produced");
            assertEquals(-221, host.error());
        }
    }

    @Test
    void aStatusLineWithOneChangedCharacterFailsItsCheck() {
        DeviceStatus s = new DeviceStatus(12, true, 3, 0, 110, 40960, 40);
        String line = s.line();
        assertEquals(s, DeviceStatus.parse(line));
        for (int i = DeviceStatus.PREFIX.length(); i < line.length(); i++) {
            char c = line.charAt(i);
            String damaged = line.substring(0, i) + (char) (c == '9' ? '8' : c + 1) + line.substring(i + 1);
            assertEquals(null, DeviceStatus.parse(damaged), damaged);
            assertEquals(null, DeviceStatus.parse(line.substring(0, i) + line.substring(i + 1)), "cut at " + i);
        }
    }
}
