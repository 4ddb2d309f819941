package org.tautline.driver.serial;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.zip.CRC32;

import org.junit.jupiter.api.Test;
import org.tautline.driver.RigLinkException.Kind;

class BlockCodecTest {
    static DataBlock block(long sequence, long first, SampleFormat format, int n) {
        double[][] s = new double[2][n];
        for (int i = 0; i < n; i++) {
            s[0][i] = 0.25 * i - 1.0;
            s[1][i] = -0.5 * i;
        }
        return new DataBlock(sequence, first, format, s);
    }

    static final double[] UNIT = {1.0 / 64, 1.0 / 64};

    @Test
    void crc32OfTheStandardCheckStringIsCbf43926() {
        // Source: CRC-32 (ISO-HDLC) check value of "123456789", the CRC catalogue's common practice.
        CRC32 crc = new CRC32();
        crc.update("123456789".getBytes(StandardCharsets.US_ASCII));
        assertEquals(0xCBF43926L, crc.getValue());
    }

    @Test
    void framesABlockAsAnIeee4882DefiniteLengthArbitraryBlock() {
        // Source: IEEE 488.2-1992, 8.7.9 (from memory): '#', digit count, length, payload.
        byte[] b = BlockCodec.encode(block(7, 1000, SampleFormat.FLOAT32_LE, 3), UNIT);
        int payload = 24 + 2 * 3 * 4 + 4;
        assertEquals("#252", new String(b, 0, 4, StandardCharsets.US_ASCII));
        assertEquals(52, payload);
        assertEquals(4 + payload + 1, b.length);
        assertEquals('S', b[4]);
        assertEquals('B', b[5]);
        assertEquals(1, b[6]);
        assertEquals(1, b[7]);
        assertEquals(7, b[8]);
        assertEquals((byte) 0xE8, b[12]);
        assertEquals(3, b[12 + 1]);
        assertEquals('\n', b[b.length - 1]);
        CRC32 crc = new CRC32();
        crc.update(b, 4, payload - 4);
        assertEquals((int) crc.getValue(), (int) BlockCodec.I32.get(b, 4 + payload - 4));
    }

    @Test
    void roundTripsEveryFormat() {
        for (SampleFormat f : SampleFormat.values()) {
            DataBlock original = block(42, 5, f, 100);
            Recorder r = new Recorder();
            StreamDecoder d = new StreamDecoder("test", 1 << 20, r);
            d.sensitivity(UNIT);
            byte[] bytes = BlockCodec.encode(original, UNIT);
            d.feed(bytes, 0, bytes.length);
            assertEquals(List.of(), r.faults, f.toString());
            assertEquals(1, r.blocks.size());
            DataBlock got = r.blocks.get(0);
            assertEquals(42, got.sequence());
            assertEquals(5, got.firstSampleIndex());
            assertEquals(f, got.format());
            // The test values are exact in binary32 and in 24-bit counts of 1/64.
            assertArrayEquals(original.samples()[0], got.samples()[0], 0.0);
            assertArrayEquals(original.samples()[1], got.samples()[1], 0.0);
        }
    }

    @Test
    void decodesWhateverTheChunkingAndSeparatesLinesFromBlocks() {
        byte[] a = "*IDN reply\r\n".getBytes(StandardCharsets.US_ASCII);
        byte[] b = BlockCodec.encode(block(1, 0, SampleFormat.INT24_LE, 50), UNIT);
        byte[] c = "0,\"No error\"\n".getBytes(StandardCharsets.US_ASCII);
        byte[] all = new byte[a.length + b.length + c.length];
        System.arraycopy(a, 0, all, 0, a.length);
        System.arraycopy(b, 0, all, a.length, b.length);
        System.arraycopy(c, 0, all, a.length + b.length, c.length);
        for (int chunk = 1; chunk <= all.length; chunk += 7) {
            Recorder r = new Recorder();
            StreamDecoder d = new StreamDecoder("test", 1 << 20, r);
            d.sensitivity(UNIT);
            for (int i = 0; i < all.length; i += chunk) {
                d.feed(all, i, Math.min(chunk, all.length - i));
            }
            assertEquals(List.of("*IDN reply", "0,\"No error\""), r.lines, "chunk " + chunk);
            assertEquals(1, r.blocks.size(), "chunk " + chunk);
            assertEquals(List.of(), r.faults, "chunk " + chunk);
        }
    }

    @Test
    void reportsADamagedBlockWithAnExactMessageAndFindsTheNextOne() {
        byte[] bad = BlockCodec.encode(block(9, 0, SampleFormat.FLOAT32_LE, 10), UNIT);
        bad[40] ^= 1;
        byte[] good = BlockCodec.encode(block(10, 10, SampleFormat.FLOAT32_LE, 10), UNIT);
        Recorder r = new Recorder();
        StreamDecoder d = new StreamDecoder("/dev/ttyX", 1 << 20, r);
        d.feed(bad, 0, bad.length);
        d.feed(good, 0, good.length);
        assertEquals(Kind.CRC, r.faults.get(0).kind());
        assertEquals("data block (sequence 9 as received) failed its CRC-32 on /dev/ttyX; expected the CRC-32 over"
                + " header and samples to match; the host re-requests the block", r.faults.get(0).getMessage());
        assertEquals(1, r.blocks.size());
        assertEquals(10, r.blocks.get(0).sequence());
    }

    @Test
    void aBlockWhoseLengthNeverCompletesIsAbandonedAndWhatFollowedIsDecoded() {
        byte[] good = BlockCodec.encode(block(3, 0, SampleFormat.FLOAT32_LE, 4), UNIT);
        byte[] head = "#800100000".getBytes(StandardCharsets.US_ASCII);
        Recorder r = new Recorder();
        StreamDecoder d = new StreamDecoder("p", 1 << 20, r);
        d.feed(head, 0, head.length);
        // Not a plausible header (no magic), so it is text; the block after it must still be found.
        d.feed(good, 0, good.length);
        assertEquals(1, r.blocks.size());
        assertEquals("1 stray bytes arrived before a data block on p; expected a data block to start a line".replace("1 ",
                head.length + " "), r.faults.get(0).getMessage());
        byte[] truncated = BlockCodec.encode(block(4, 4, SampleFormat.FLOAT32_LE, 400), UNIT);
        Recorder r2 = new Recorder();
        StreamDecoder d2 = new StreamDecoder("p", 1 << 20, r2);
        d2.feed(truncated, 0, 100);
        d2.feed(good, 0, good.length);
        assertEquals(0, r2.blocks.size(), "the good block sits inside the claimed length");
        d2.abandonPending();
        assertEquals(1, r2.blocks.size());
        assertEquals(0, d2.pendingBytes());
    }

    @Test
    void parsesCommandsAndErrorReplies() {
        CommandLine c = CommandLine.parse("drive:sine 250.5, 1.0E-1");
        assertEquals("DRIVE:SINE", c.header());
        assertEquals(List.of("250.5", "1.0E-1"), c.parameters());
        assertEquals("ACQ:CHAN?", CommandLine.parse("acq:chan? 1").name());
        assertNull(CommandLine.parse("   "));
        assertEquals("-113,\"Undefined header; SAY:\"\"HI\"\"\"", new DeviceError(-113, "Undefined header; SAY:\"HI\"").reply());
        assertEquals(new DeviceError(-113, "Undefined header; SAY:\"HI\""),
                DeviceError.parse("-113,\"Undefined header; SAY:\"\"HI\"\"\""));
        assertEquals(DeviceError.NONE, DeviceError.parse("0,\"No error\""));
        assertNull(DeviceError.parse("garbage"));
        assertEquals(SampleFormat.INT24_LE, SampleFormat.ofMnemonic("i24"));
    }
}
