package org.tautline.analysis.format;

import java.nio.charset.Charset;
import java.nio.charset.CharsetEncoder;
import java.util.Optional;

import org.tautline.analysis.AnalysisException;

/**
 * Which symbols an output can show: the plus-minus sign, powers in units ({@code m²}) and superscript exponents
 * ({@code × 10⁻⁶}); each falls back to ASCII ({@code +/-}, {@code m^2}, {@code e-6}) when the output's character set
 * cannot encode it.
 *
 * <p>Java 17 writes standard output in the platform's character set, which is US-ASCII under {@code LANG=C}; there
 * a "±" would print as "?", so {@link #forStandardOutput()} picks the ASCII forms.
 *
 * @param plusMinus the sign between a value and its uncertainty: {@code "±"} or {@code "+/-"}
 * @param unitPowers whether units are written with superscript powers ({@code N m²}) rather than {@code N m^2}
 * @param superscriptExponents whether a power of ten is written {@code × 10⁻⁶} rather than {@code e-6}
 */
public record TextStyle(String plusMinus, boolean unitPowers, boolean superscriptExponents) {
    /** Every symbol in Unicode: a UTF-8 terminal, the window. */
    public static final TextStyle UNICODE = new TextStyle("±", true, true);
    /** Plain ASCII: {@code +/-}, {@code m^2}, {@code e-6}. */
    public static final TextStyle ASCII = new TextStyle("+/-", false, false);
    private static final String POWERS = "²³";
    private static final String EXPONENTS = "×⁰¹²³⁴⁵⁶⁷⁸⁹⁻";

    /** Checks the sign is one of the two forms. */
    public TextStyle {
        if (!"±".equals(plusMinus) && !"+/-".equals(plusMinus)) {
            throw new AnalysisException("the plus-minus sign is \"±\" or \"+/-\", got \"" + plusMinus + "\"");
        }
    }

    /**
     * The richest style a character set can encode.
     *
     * @param charset the output's character set
     * @return Unicode symbols where the charset encodes them, ASCII forms for the rest
     */
    public static TextStyle forCharset(Charset charset) {
        CharsetEncoder encoder = charset.newEncoder();
        boolean plusMinus = encoder.canEncode("±");
        return new TextStyle(plusMinus ? "±" : "+/-", encoder.canEncode(POWERS), encoder.canEncode(EXPONENTS));
    }

    /**
     * The style for this process's standard output: Java 17 encodes it in {@code sun.stdout.encoding} when that is
     * set (a console), otherwise in the default charset, which follows {@code LANG}/{@code LC_ALL}.
     *
     * @return the style standard output can show
     */
    public static TextStyle forStandardOutput() {
        return forCharset(standardOutputCharset());
    }

    /** @return the character set Java 17 (and picocli) encode standard output in */
    static Charset standardOutputCharset() {
        return Optional.ofNullable(System.getProperty("sun.stdout.encoding")).filter(Charset::isSupported)
                .map(Charset::forName).orElse(Charset.defaultCharset());
    }

    /**
     * The style of a PDF written with the standard 14 fonts in WinAnsiEncoding (PDF 32000-1:2008, annex D, from
     * memory): it has "±", "²" and "³", but no superscript minus, so powers of ten are written {@code e-6}.
     *
     * @return the style the report's fonts can show
     */
    public static TextStyle forStandardPdfFonts() {
        return forCharset(Charset.forName("windows-1252"));
    }
}
