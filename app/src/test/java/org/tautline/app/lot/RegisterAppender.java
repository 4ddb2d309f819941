package org.tautline.app.lot;

import java.time.Instant;
import java.util.List;

/** Test helper run in its own JVM: appends COUNT entries to LOT in the register at LOCATION. */
public final class RegisterAppender {
    private RegisterAppender() {
    }

    /** @param args LOCATION LOT COUNT NAME */
    public static void main(String[] args) {
        int count = Integer.parseInt(args[2]);
        try (LotRegister register = LotRegister.open(args[0])) {
            for (int i = 0; i < count; i++) {
                register.append(new LotEntry(args[1], args[3] + "-" + i, Instant.now(), "PASS", "",
                        List.of(new LotFigure("tensionN", 150 + i, 1.5, "N", 135, 165),
                                new LotFigure("f1Hz", 230 + 0.1 * i, 0.01, "Hz", 215, 245))));
            }
        }
    }
}
