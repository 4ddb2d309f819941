package org.tautline.app.lot;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.HexFormat;
import java.util.List;
import java.util.stream.Stream;

/**
 * Test helper run in its own JVM: waits until PARTIES processes have opened the register (each leaves a file in the
 * folder BARRIER), then appends COUNT entries to LOT in the register at LOCATION and, between them, tries to add RUNS
 * run folders (the same ones in every process) to the lot RUNS, where each may be added once.
 */
public final class RegisterAppender {
    private RegisterAppender() {
    }

    /** @param args LOCATION LOT COUNT NAME RUNS BARRIER PARTIES */
    public static void main(String[] args) throws IOException {
        int count = Integer.parseInt(args[2]);
        int runs = Integer.parseInt(args[4]);
        int added = 0;
        try (LotRegister register = LotRegister.openForAppending(args[0])) {
            awaitParties(Path.of(args[5]), args[3], Integer.parseInt(args[6]));
            for (int i = 0; i < Math.max(count, runs); i++) {
                if (i < count) {
                    register.append(new LotEntry(args[1], args[3] + "-" + i, Instant.now(), "PASS", "",
                            List.of(new LotFigure("tensionN", 150 + i, 1.5, "N", 135, 165),
                                    new LotFigure("f1Hz", 230 + 0.1 * i, 0.01, "Hz", 215, 245))));
                }
                if (i < runs) {
                    String sha = HexFormat.of().toHexDigits((long) i).repeat(4);
                    try {
                        register.append(new LotEntry("RUNS", "R-" + i, Instant.now(), "PASS", "/runs/r-" + i, List.of(), sha));
                        added++;
                    } catch (LotRegisterException e) {
                        if (!e.getMessage().contains("expected each run once in a lot")) {
                            throw e;
                        }
                    }
                }
            }
        }
        System.out.println(args[3] + " added " + added + " of " + runs + " runs");
    }

    /** A start line: every process begins appending once all have their register open, so that the appends overlap. */
    private static void awaitParties(Path barrier, String name, int parties) throws IOException {
        Files.createFile(barrier.resolve(name + ".ready"));
        long deadline = System.nanoTime() + 60_000_000_000L;
        while (true) {
            try (Stream<Path> ready = Files.list(barrier)) {
                if (ready.count() >= parties) {
                    return;
                }
            }
            if (System.nanoTime() > deadline) {
                throw new IllegalStateException("the other appenders did not start within 60 s");
            }
            try {
                Thread.sleep(10); // polling a start line, not waiting for a result
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("interrupted at the start line", e);
            }
        }
    }
}
