package org.tautline.driver.serial;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.tautline.driver.RigLinkException;

@Timeout(value = 60)
class DecoderFuzzTest {
    private static final int STREAMS = 10_000;

    /** Six lines and six blocks; {@code blockFourAt[0]} receives where block 4's reply line starts. */
    private static byte[] cleanStream(SplittableRandom rnd, int blocks, int[] blockFourAt) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        for (int k = 0; k < blocks; k++) {
            if (k == 4) {
                blockFourAt[0] = out.size();
            }
            SampleFormat f = SampleFormat.values()[rnd.nextInt(3)];
            out.writeBytes(("0,\"No error\"\n").getBytes(java.nio.charset.StandardCharsets.US_ASCII));
            out.writeBytes(BlockCodec.encode(BlockCodecTest.block(k, 100L * k, f, 1 + rnd.nextInt(60)),
                    BlockCodecTest.UNIT));
        }
        return out.toByteArray();
    }

    /** One seeded mutation: flip, cut, duplicate or insert garbage, somewhere in the first part. */
    private static byte[] mutate(byte[] clean, SplittableRandom rnd, int limit) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        int at = rnd.nextInt(limit);
        int span = 1 + rnd.nextInt(Math.min(40, limit - at));
        out.write(clean, 0, at);
        switch (rnd.nextInt(4)) {
            case 0 -> {
                for (int i = at; i < at + span; i++) {
                    out.write(clean[i] ^ (1 << rnd.nextInt(8)));
                }
            }
            case 1 -> { }
            case 2 -> {
                out.write(clean, at, span);
                out.write(clean, at, span);
            }
            default -> {
                for (int i = 0; i < span; i++) {
                    out.write(rnd.nextInt(5) == 0 ? '#' : rnd.nextInt(256));
                }
                out.write(clean, at, span);
            }
        }
        out.write(clean, at + span, clean.length - at - span);
        return out.toByteArray();
    }

    @Test
    void tenThousandMutatedStreamsNeverThrowNeverHangAndKeepDecodingAfterTheDamage() {
        SplittableRandom rnd = new SplittableRandom(20240611L);
        long start = System.nanoTime();
        int decodedAfterDamage = 0;
        for (int s = 0; s < STREAMS; s++) {
            int[] blockFourAt = new int[1];
            byte[] clean = cleanStream(rnd, 6, blockFourAt);
            byte[] mutated = mutate(clean, rnd, blockFourAt[0] - 40);
            Recorder r = new Recorder();
            StreamDecoder d = new StreamDecoder("fuzz", 1 << 20, r);
            d.sensitivity(BlockCodecTest.UNIT);
            try {
                for (int i = 0; i < mutated.length;) {
                    int n = Math.min(1 + rnd.nextInt(300), mutated.length - i);
                    d.feed(mutated, i, n);
                    i += n;
                }
                d.abandonPending();
            } catch (RigLinkException e) {
                // Allowed by the decoder's contract, though it reports faults as events.
                continue;
            }
            // The last two blocks lie wholly after the damage: both must be decoded intact.
            boolean sawFour = r.blocks.stream().anyMatch(b -> b.sequence() == 4 && b.firstSampleIndex() == 400);
            boolean sawFive = r.blocks.stream().anyMatch(b -> b.sequence() == 5 && b.firstSampleIndex() == 500);
            assertTrue(sawFour && sawFive, "stream " + s + ": blocks after the damage lost; got " + r.blocks.size());
            decodedAfterDamage++;
            for (DataBlock b : r.blocks) {
                assertEquals(2, b.samples().length);
            }
        }
        assertEquals(STREAMS, decodedAfterDamage);
        double seconds = (System.nanoTime() - start) * 1e-9;
        assertTrue(seconds < 50, "fuzzing took " + seconds + " s; the decoder must never wait");
    }
}
