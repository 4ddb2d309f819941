package org.tautline.analysis.frf;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.List;
import java.util.Random;

/** Mutates valid files into nearly valid ones for fuzz tests, from a seeded random stream. */
final class Mutator {
    private final Random random;
    private final List<byte[]> tokens;

    Mutator(long seed, List<String> tokens) {
        this.random = new Random(seed);
        this.tokens = tokens.stream().map(t -> t.getBytes(StandardCharsets.ISO_8859_1)).toList();
    }

    /** @return a copy of the file with one to three mutations applied */
    byte[] mutate(byte[] file) {
        byte[] out = file;
        int count = 1 + random.nextInt(3);
        for (int m = 0; m < count; m++) {
            out = once(out);
        }
        return out;
    }

    private byte[] once(byte[] in) {
        int n = in.length;
        switch (random.nextInt(7)) {
            case 0: {
                byte[] out = in.clone();
                int flips = 1 + random.nextInt(4);
                for (int i = 0; i < flips && n > 0; i++) {
                    out[random.nextInt(n)] ^= (byte) (1 + random.nextInt(255));
                }
                return out;
            }
            case 1: {
                int a = random.nextInt(n + 1);
                int b = Math.min(n, a + random.nextInt(Math.max(1, n / 4)));
                return splice(in, a, b, new byte[0]);
            }
            case 2: {
                int a = random.nextInt(n + 1);
                int b = Math.min(n, a + random.nextInt(Math.max(1, n / 4)));
                int at = random.nextInt(n + 1);
                return splice(in, at, at, Arrays.copyOfRange(in, a, b));
            }
            case 3: {
                byte[] noise = new byte[1 + random.nextInt(16)];
                random.nextBytes(noise);
                int at = random.nextInt(n + 1);
                return splice(in, at, at, noise);
            }
            case 4:
                return Arrays.copyOf(in, random.nextInt(n + 1));
            case 5: {
                int at = random.nextInt(n + 1);
                return splice(in, at, at, tokens.get(random.nextInt(tokens.size())));
            }
            default: {
                byte[] token = tokens.get(random.nextInt(tokens.size()));
                int at = random.nextInt(n + 1);
                return splice(in, at, Math.min(n, at + token.length), token);
            }
        }
    }

    private static byte[] splice(byte[] in, int from, int to, byte[] insert) {
        ByteArrayOutputStream out = new ByteArrayOutputStream(in.length + insert.length);
        out.write(in, 0, from);
        out.writeBytes(insert);
        out.write(in, to, in.length - to);
        return out.toByteArray();
    }
}
