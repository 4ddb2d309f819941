package org.tautline.driver.serial;

import java.util.List;
import java.util.Map;

import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.RigDriver;
import org.tautline.driver.spi.RigOption;
import org.tautline.driver.spi.RigOptionValues;

/**
 * The {@code serial} rig driver: opens a {@link SerialRig} on a serial port.
 *
 * <p>Options: {@code port} (required, a path such as {@code /dev/ttyUSB0} or a system name such as
 * {@code COM3}), {@code baud} (default 921600) and {@code timeoutMs} (reply timeout, default 2000 ms).
 */
public final class SerialRigDriver implements RigDriver {
    @Override
    public String name() {
        return "serial";
    }

    @Override
    public String description() {
        return "a rig on a serial port speaking Tautline's SCPI-style command and block protocol";
    }

    @Override
    public List<RigOption> options() {
        return List.of(RigOption.required("port", "the serial port, for example /dev/ttyUSB0 or COM3", ""),
                RigOption.withDefault("baud", "the line speed", Integer.toString(SerialLinkSettings.defaults().baud()), "baud"),
                RigOption.withDefault("timeoutMs", "how long to wait for a reply before the link counts as lost", "2000",
                        "ms"));
    }

    @Override
    public Rig open(Map<String, String> options) {
        RigOptionValues values = RigOptionValues.of(this, options);
        SerialLinkSettings settings = SerialLinkSettings.defaults()
                .withBaud(values.wholeNumber("baud", 300, 4_000_000))
                .withReplyTimeoutMs(values.wholeNumber("timeoutMs", 1, 600_000));
        return SerialRig.open(values.text("port"), settings);
    }
}
