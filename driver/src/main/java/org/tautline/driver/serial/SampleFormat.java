package org.tautline.driver.serial;

import java.util.Locale;

/** How samples are coded in a data block; the code is the byte in the block header. */
public enum SampleFormat {
    /** IEEE 754 binary32, little-endian, in engineering units. */
    FLOAT32_LE(1, 4, "F32"),
    /** Two's-complement 24-bit integer, little-endian; value = count times the channel's sensitivity. */
    INT24_LE(2, 3, "I24"),
    /** IEEE 754 binary64, little-endian, in engineering units. */
    FLOAT64_LE(3, 8, "F64");

    private final int code;
    private final int bytesPerSample;
    private final String mnemonic;

    SampleFormat(int code, int bytesPerSample, String mnemonic) {
        this.code = code;
        this.bytesPerSample = bytesPerSample;
        this.mnemonic = mnemonic;
    }

    /** @return the header code byte, 1..3 */
    public int code() {
        return code;
    }

    /** @return bytes per sample of one channel */
    public int bytesPerSample() {
        return bytesPerSample;
    }

    /** @return the name used in {@code ACQ:FORM}, for example {@code F32} */
    public String mnemonic() {
        return mnemonic;
    }

    /**
     * @param code a header code byte
     * @return the format, or null for an unknown code
     */
    static SampleFormat ofCode(int code) {
        for (SampleFormat f : values()) {
            if (f.code == code) {
                return f;
            }
        }
        return null;
    }

    /**
     * @param mnemonic {@code F32}, {@code I24} or {@code F64}, any case
     * @return the format, or null for an unknown name
     */
    static SampleFormat ofMnemonic(String mnemonic) {
        String m = mnemonic.trim().toUpperCase(Locale.ROOT);
        for (SampleFormat f : values()) {
            if (f.mnemonic.equals(m)) {
                return f;
            }
        }
        return null;
    }
}
