package org.tautline.driver.serial;

import java.nio.charset.StandardCharsets;
import java.util.Locale;
import java.util.zip.CRC32;

/**
 * What {@code LINK:STAT? tag} reports: the device's state when the reply was sent, with a CRC-32 check.
 *
 * <p>The reply line is {@code STAT tag,out,boot,errors,fault,next,seq,check}: {@code check} is the CRC-32
 * (the common ISO-HDLC CRC of {@link CRC32}) of every byte before it, {@code "STAT "} and the last comma
 * included, as 8 upper-case hexadecimal digits. A reply line carries no other protection, so the check is
 * what lets the host trust these numbers on a link that can lose bytes (PROTOCOL.md, section 4).
 *
 * @param tag the number the host sent with the query, echoed
 * @param outputOn true while the drive output is on
 * @param bootCount the boot counter ({@code LINK:BOOT?})
 * @param errorCount entries in the error queue, not removed ({@code SYST:ERR:COUNT?})
 * @param lastFault code of the latest fault that switched the output off since the last reset (101, 110), 0 for none
 * @param nextSample index of the first sample the next {@code ACQ:FETCH?} will deliver ({@code ACQ:NEXT?})
 * @param nextSequence sequence number the next {@code ACQ:FETCH?} block will carry ({@code ACQ:SEQ?})
 */
record DeviceStatus(long tag, boolean outputOn, long bootCount, int errorCount, int lastFault, long nextSample,
                    long nextSequence) {
    /** What every status line starts with. */
    static final String PREFIX = "STAT ";

    /** @return the reply line, without its terminator */
    String line() {
        String body = PREFIX + tag + "," + (outputOn ? 1 : 0) + "," + bootCount + "," + errorCount + "," + lastFault
                + "," + nextSample + "," + nextSequence + ",";
        return body + check(body);
    }

    private static String check(String body) {
        CRC32 crc = new CRC32();
        crc.update(body.getBytes(StandardCharsets.US_ASCII));
        return String.format(Locale.ROOT, "%08X", crc.getValue());
    }

    /**
     * Parses a status line.
     *
     * @param line a line starting with {@value #PREFIX}
     * @return the status, or null when the line is malformed or its check does not match
     */
    static DeviceStatus parse(String line) {
        int cut = line.lastIndexOf(',');
        if (!line.startsWith(PREFIX) || cut < 0 || !check(line.substring(0, cut + 1)).equals(line.substring(cut + 1))) {
            return null;
        }
        String[] f = line.substring(PREFIX.length(), cut).split(",", -1);
        if (f.length != 7 || !(f[1].equals("0") || f[1].equals("1"))) {
            return null;
        }
        try {
            return new DeviceStatus(Long.parseLong(f[0]), f[1].equals("1"), Long.parseLong(f[2]),
                    Integer.parseInt(f[3]), Integer.parseInt(f[4]), Long.parseLong(f[5]), Long.parseLong(f[6]));
        } catch (NumberFormatException e) {
            return null;
        }
    }

    /**
     * @param code a fault code from {@link #lastFault()}
     * @return what it means, in words
     */
    static String faultText(int code) {
        return switch (code) {
            case 0 -> "no fault reported";
            case 101 -> "fault 101, the watchdog expired";
            case 110 -> "fault 110, an amplifier fault";
            default -> "fault " + code;
        };
    }
}
