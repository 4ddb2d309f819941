package org.tautline.driver.serial;

/**
 * How long the host waits on its link, ms, derived from {@link SerialLinkSettings} and the link budget.
 *
 * @param silenceMs no byte at all from the device for this long while the host waits is a fault
 *        ({@link SerialLinkSettings#replyTimeoutMs()})
 * @param retryMs a reply, status or block still missing after this long is asked for again: the block timeout
 *        plus the time one block takes on the line, since a status reply waits for the block being sent
 * @param pollMs while waiting for the blocks of a read, the host asks {@code LINK:STAT?} this often: at most
 *        250 ms and a quarter of the device watchdog, so that a waiting host also feeds the watchdog
 * @param offConfirmMs after a fault, the longest wait for the device to confirm its output is off
 */
record LinkTiming(long silenceMs, long retryMs, long pollMs, long offConfirmMs) {
    /** Longest poll interval, ms. */
    static final long MAX_POLL_MS = 250;

    /**
     * @param s the link settings
     * @param channels channel count
     * @return the waits for that link
     */
    static LinkTiming of(SerialLinkSettings s, int channels) {
        double blockMs = LinkBudget.blockMs(s.baud(), channels, s.format(), s.blockSamples());
        return new LinkTiming(s.replyTimeoutMs(), s.blockTimeoutMs() + (long) Math.ceil(blockMs),
                Math.max(10, Math.min(MAX_POLL_MS, s.watchdogMs() / 4)), SerialRig.OFF_CONFIRM_MS);
    }
}
