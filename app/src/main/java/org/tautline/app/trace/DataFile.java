package org.tautline.app.trace;

import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/**
 * A data file a report rests on, with its SHA-256 (FIPS 180-4) so that anyone can check the file they hold is the one
 * that was analysed.
 *
 * @param name the file's name in the run folder
 * @param sha256 its SHA-256, lower-case hex
 */
public record DataFile(String name, String sha256) {
    /** Checks the name and the digest's form. */
    public DataFile {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a data file needs a name");
        }
        if (sha256 == null || !sha256.matches("[0-9a-f]{64}")) {
            throw new IllegalArgumentException("a SHA-256 is 64 lower-case hex digits, got " + sha256);
        }
    }

    /**
     * @param name the file's name
     * @param bytes its bytes
     * @return the file with the SHA-256 of its bytes
     */
    public static DataFile of(String name, byte[] bytes) {
        return new DataFile(name, sha256(bytes));
    }

    /** @return the lower-case hex SHA-256 of the bytes */
    public static String sha256(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        }
    }
}
