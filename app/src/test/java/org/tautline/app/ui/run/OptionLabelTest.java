package org.tautline.app.ui.run;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.tautline.driver.spi.RigOption;

/** A rig driver's settings are named in words on the rig screen, their keys kept for the command line. */
class OptionLabelTest {
    @Test
    void namesTheSettingInWordsWithTheUnitApart() {
        assertEquals("Timeout (ms)", OptionLabel.of(RigOption.withDefault("timeoutMs", "how long to wait", "2000", "ms")));
        assertEquals("Tension (N)", OptionLabel.of(RigOption.withDefault("tensionN", "the true tension", "none", "N")));
        assertEquals("Port", OptionLabel.of(RigOption.required("port", "the serial port", "")));
        assertEquals("Baud", OptionLabel.of(RigOption.withDefault("baud", "the line speed", "921600", "baud")));
        assertEquals("Link retry time (ms)", OptionLabel.of(RigOption.withDefault("link.retryTimeMs", "retry", "5", "ms")));
    }
}
