package org.tautline.app.ui.run;

import java.util.List;
import java.util.Map;
import java.util.function.Consumer;

import org.tautline.driver.spi.ChannelInfo;
import org.tautline.driver.spi.RigDriver;
import org.tautline.driver.spi.RigDrivers;
import org.tautline.driver.spi.SampleBlock;

/**
 * Opening a rig through its driver, tapped for live traces, with a health summary. Free of Swing; blocks.
 */
public final class RigConnection {
    private RigConnection() {
    }

    /**
     * Connects.
     *
     * @param drivers the drivers found (built-in and plugins)
     * @param driverName the driver's short name, for example {@code sim}
     * @param options the driver's settings as typed; empty ones are left out so the default applies
     * @param tap receives every sample block the sweep reads
     * @return the rig, tapped; the caller closes it
     * @throws org.tautline.driver.RigException when the driver is unknown, an option is wrong or the rig cannot be reached
     */
    public static TappedRig open(RigDrivers drivers, String driverName, Map<String, String> options,
                                 Consumer<SampleBlock> tap) {
        RigDriver driver = drivers.find(driverName);
        Map<String, String> given = new java.util.LinkedHashMap<>();
        options.forEach((k, v) -> {
            if (v != null && !v.isBlank()) {
                given.put(k, v.trim());
            }
        });
        return new TappedRig(driver.open(given), tap);
    }

    /**
     * @param rig a connected rig
     * @return lines saying what the rig is and whether it suits a sweep: channels, rate, drive limit
     */
    public static List<String> health(TappedRig rig) {
        List<ChannelInfo> channels = rig.acquisition().channels();
        StringBuilder ch = new StringBuilder();
        for (int i = 0; i < channels.size(); i++) {
            ChannelInfo c = channels.get(i);
            ch.append(i == 0 ? "" : "; ").append(i).append(": ").append(c.name()).append(" (").append(c.quantity())
                    .append(", ").append(c.unit()).append(')');
        }
        boolean forceFirst = !channels.isEmpty() && "force".equals(channels.get(0).quantity());
        return List.of("Identity: " + rig.identity(),
                "Channels: " + ch,
                String.format(java.util.Locale.ROOT, "Sample rate: %.0f Hz; drive limit: %.2f V peak",
                        rig.acquisition().sampleRateHz(), rig.exciter().maxAmplitudeV()),
                forceFirst && channels.size() >= 2 ? "Health: ready (force on channel 0, response on channel 1)"
                        : "Health: NOT ready: a sweep needs force on channel 0 and a response on channel 1");
    }
}
