package org.tautline.driver.serial;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import org.junit.jupiter.api.Test;

/** PROTOCOL.md agrees with the code: its link budget, its block framing examples, its status lines. */
class ProtocolDocumentTest {
    private static List<String> lines() throws IOException {
        return Files.readAllLines(Path.of("PROTOCOL.md"), StandardCharsets.UTF_8);
    }

    @Test
    void theLinkBudgetTableIsWhatTheBlockLayoutGives() throws IOException {
        List<String> doc = lines();
        int header = doc.indexOf(doc.stream().filter(l -> l.startsWith("| Channels | Format |")).findFirst()
                .orElseThrow());
        String[] head = doc.get(header).split("\\|");
        int rows = 0;
        for (String line : doc.subList(header + 2, doc.size())) {
            if (!line.startsWith("|")) {
                break;
            }
            String[] f = line.split("\\|");
            int channels = Integer.parseInt(f[1].strip());
            SampleFormat format = SampleFormat.ofMnemonic(f[2].strip());
            assertNotNull(format, line);
            assertEquals(LinkBudget.blockBytes(channels, 1024, format), Long.parseLong(f[3].strip()), line);
            // Line rate: 10 bits per byte at 8N1 (common practice), 20000 samples per second.
            assertEquals(String.format(Locale.ROOT, "%,.0f", 10 * LinkBudget.requiredBytesPerS(20000, channels, format,
                    1024)), f[4].strip(), line);
            for (int col = 5; col < head.length; col++) {
                int baud = Integer.parseInt(head[col].strip());
                assertEquals(String.format(Locale.ROOT, "%,d", (long) LinkBudget.maxSampleRateHz(baud, channels, format,
                        1024)), f[col].strip(), line + " at " + baud + " baud");
            }
            rows++;
        }
        assertEquals(9, rows);
        // The statement under the table: 2 channels of F32 at 20 kS/s need about 1.61 Mbit/s; 921600 baud carries 57 %.
        assertTrue(LinkBudget.maxSampleRateHz(921600, 2, SampleFormat.FLOAT32_LE, 1024) < 20000);
        assertEquals(0.57, LinkBudget.maxSampleRateHz(921600, 2, SampleFormat.FLOAT32_LE, 1024) / 20000, 0.005);
        assertTrue(LinkBudget.maxSampleRateHz(2000000, 2, SampleFormat.FLOAT32_LE, 1024) > 20000);
    }

    @Test
    void theFramingExamplesAreWhatTheCodecWrites() throws IOException {
        String doc = String.join("\n", lines());
        double[] unit = {1, 1};
        String[] expected = {"#48220", "#43644", "#252"};
        int[] samples = {1024, 452, 3};
        for (int i = 0; i < samples.length; i++) {
            byte[] b = BlockCodec.encode(new DataBlock(7, 1000, SampleFormat.FLOAT32_LE, new double[2][samples[i]]), unit);
            assertEquals(expected[i], new String(b, 0, expected[i].length(), StandardCharsets.US_ASCII));
            assertTrue(doc.contains(expected[i]), expected[i] + " in PROTOCOL.md");
        }
    }

    @Test
    void everyStatusLineInTheDocumentPassesItsCheck() throws IOException {
        int found = 0;
        for (String line : lines()) {
            int at = line.indexOf("< STAT ");
            if (at >= 0) {
                String status = line.substring(at + 2).split("\\s+\\(")[0].strip();
                assertNotNull(DeviceStatus.parse(status), status);
                found++;
            }
        }
        assertTrue(found >= 8, found + " status lines");
    }
}
