package org.tautline.analysis.frf;

/** How one sample of a WAV data chunk is stored: little-endian PCM integers or IEEE floats. */
enum WavEncoding {
    /** Signed 16-bit integer, scaled by 2^-15. */
    PCM16(2, false),
    /** Signed 24-bit integer, scaled by 2^-23. */
    PCM24(3, false),
    /** Signed 32-bit integer, scaled by 2^-31. */
    PCM32(4, false),
    /** IEEE 754 binary32. */
    FLOAT32(4, true),
    /** IEEE 754 binary64. */
    FLOAT64(8, true);

    private final int bytes;
    private final boolean floating;

    WavEncoding(int bytes, boolean floating) {
        this.bytes = bytes;
        this.floating = floating;
    }

    /** @return bytes per sample */
    int bytes() {
        return bytes;
    }

    /** @return true for IEEE floats, whose samples may be NaN or infinite */
    boolean floating() {
        return floating;
    }

    /**
     * The encoding of a format code and bit depth.
     *
     * @param formatCode 1 (PCM) or 3 (IEEE float)
     * @param bits bits per sample
     * @return the encoding, or null when the pair is not supported
     */
    static WavEncoding of(int formatCode, int bits) {
        if (formatCode == 1) {
            return bits == 16 ? PCM16 : bits == 24 ? PCM24 : bits == 32 ? PCM32 : null;
        }
        if (formatCode == 3) {
            return bits == 32 ? FLOAT32 : bits == 64 ? FLOAT64 : null;
        }
        return null;
    }
}
