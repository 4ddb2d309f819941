package org.tautline.analysis.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;

/**
 * The formatter against the GUM's own examples (JCGM 100:2008, "Evaluation of measurement data: Guide to the
 * expression of uncertainty in measurement", clauses 7.2.2, 7.2.4 and 7.2.6; values from memory) and edge cases.
 */
class QuantityFormatTest {
    private final QuantityFormat unicode = new QuantityFormat(TextStyle.UNICODE);
    private final QuantityFormat ascii = new QuantityFormat(TextStyle.ASCII);

    @Test
    void writesTheStandardOfMassAsGum722Does() {
        // GUM 7.2.2, fourth scheme (from memory): m_S = (100.021 47 ± 0.000 35) g for u_c = 0.35 mg
        assertEquals("(100.02147 ± 0.00035) g", unicode.withUncertainty(100.021473, 0.000354, "g"),
                "GUM 7.2.2 example (from memory)");
        assertEquals("(100.02147 +/- 0.00035) g", ascii.withUncertainty(100.021473, 0.000354, "g"),
                "GUM 7.2.2 example in ASCII (from memory)");
    }

    @Test
    void writesTheExpandedUncertaintyOfGum724() {
        // GUM 7.2.4 (from memory): U = k u_c = 2.26 x 0.35 mg = 0.79 mg, m_S = (100.021 47 ± 0.000 79) g
        assertEquals("(100.02147 ± 0.00079) g", unicode.withUncertainty(100.02147, 2.26 * 0.00035, "g"),
                "GUM 7.2.4 example (from memory)");
    }

    @Test
    void roundsTheValueToTheUncertaintyAsGum726Does() {
        // GUM 7.2.6 (from memory): y = 10.057 62 ohm with u_c = 27 mohm is written 10.058 ohm
        Rounded r = unicode.round(10.05762, 0.027);
        assertEquals("10.058", r.value(), "GUM 7.2.6: value rounded to the uncertainty's last digit (from memory)");
        assertEquals("0.027", r.uncertainty(), "GUM 7.2.6 (from memory)");
        assertEquals(0, r.exponent());
        // GUM 7.2.6 (from memory): u = 28.05 kHz is rounded down to 28 kHz
        assertEquals("28 kHz", unicode.uncertainty(28.05, "kHz"), "GUM 7.2.6 example (from memory)");
        // GUM 7.2.6 allows 10.47 mohm to be rounded up to 11; we round to the nearest, as in its 28.05 kHz example
        assertEquals("10 mOhm", unicode.uncertainty(10.47, "mOhm"), "GUM 7.2.6: nearest rounding (from memory)");
    }

    @Test
    void carriesWhenTheUncertaintyRoundsUpToAnotherDecade() {
        assertEquals("0.10", unicode.uncertainty(0.0996, ""), "two significant digits with the carry (GUM 7.2.6)");
        assertEquals("(1.23 ± 0.10) N", unicode.withUncertainty(1.2345, 0.0996, "N"),
                "the value follows the carried uncertainty's decimal place (GUM 7.2.6)");
        assertEquals("1.0", unicode.uncertainty(0.996, ""), "carry at 1 (GUM 7.2.6)");
        assertEquals("0.13", unicode.uncertainty(0.125, ""), "a half-way case rounds away from zero (common practice)");
    }

    @Test
    void keepsTheSignOfNegativeValues() {
        assertEquals("(-12.346 ± 0.012) N", unicode.withUncertainty(-12.3456, 0.0123, "N"), "negative value");
        assertEquals("0.000 ± 0.012", unicode.withUncertainty(-0.0001, 0.0123, ""),
                "a value that rounds to zero is written without a sign");
    }

    @Test
    void writesSmallAndLargeMagnitudesInEngineeringNotation() {
        assertEquals("(614 ± 61) × 10⁻⁶ N m²", unicode.withUncertainty(6.1432e-4, 6.14e-5, "N m^2"),
                "engineering notation: a power of ten that is a multiple of 3 (common practice)");
        assertEquals("(614 +/- 61)e-6 N m^2", ascii.withUncertainty(6.1432e-4, 6.14e-5, "N m^2"), "ASCII form");
        assertEquals("(1.235 ± 0.012) × 10⁹ Pa", unicode.withUncertainty(1.23456e9, 1.2e7, "Pa"), "large value");
        assertEquals("(12.3 +/- 1.1)e-6 m/N", ascii.withUncertainty(1.2345e-5, 1.1e-6, "m/N"), "receptance");
        Rounded r = unicode.round(1.2345e-5, 1.1e-6);
        assertEquals("12.3e-6", unicode.valueCell(r), "table cell");
        assertEquals("1.1e-6", unicode.uncertaintyCell(r), "table cell");
        assertEquals("614e-6", ascii.number(6.14e-4), "a value without uncertainty in engineering notation");
        assertEquals("1.5 × 10⁹", unicode.number(1.5e9), "a large value without uncertainty");
    }

    @Test
    void keepsEverydayMagnitudesInFull() {
        assertEquals("(150.3 ± 1.2) N", unicode.withUncertainty(150.2789, 1.234, "N"), "tension");
        assertEquals("0.00350 ± 0.00012", unicode.withUncertainty(0.0035012, 0.000123, ""),
                "a damping ratio of 0.35 % is written in full");
        assertEquals("(12300 ± 1200) N", unicode.withUncertainty(12345.6, 1234, "N"),
                "an uncertainty above ten rounds the value's units digits");
        assertEquals("0.6 m", unicode.value(0.6, "m"), "a stated value keeps only its own digits");
        assertEquals("142.402 Hz", unicode.value(142.40234, "Hz"), "six significant digits at most");
    }

    @Test
    void saysWhenNoUncertaintyWasEvaluated() {
        String text = unicode.withUncertainty(150.0, Double.NaN, "N");
        assertEquals("150 N, uncertainty not evaluated", text);
        assertFalse(text.contains("0.0"), "an uncertainty not evaluated is never written as zero: " + text);
        assertEquals("not evaluated", unicode.uncertainty(Double.NaN, "N"));
        assertEquals("(150 ± 0) N", unicode.withUncertainty(150.0, 0.0, "N"), "a stated exact value");
    }

    @Test
    void saysWhenNoValueWasDetermined() {
        assertEquals("not determined", unicode.withUncertainty(Double.NaN, 1.0, "N"));
        assertEquals("infinity N", unicode.value(Double.POSITIVE_INFINITY, "N"));
        assertEquals("-infinity", unicode.number(Double.NEGATIVE_INFINITY));
        assertEquals("150 N, uncertainty unbounded", unicode.withUncertainty(150, Double.POSITIVE_INFINITY, "N"));
        assertThrows(AnalysisException.class, () -> unicode.withUncertainty(1, -0.1, "N"));
        assertThrows(AnalysisException.class, () -> unicode.round(Double.NaN, 0.1));
    }

    @Test
    void writesADimensionlessFigureWithoutUnit() {
        assertEquals("(194 ± 12) × 10⁻⁶", unicode.withUncertainty(1.94e-4, 1.2e-5, ""), "inharmonicity B");
        assertEquals("", unicode.unit(""));
        assertEquals("1/kg", unicode.unit("1/kg"));
        assertEquals("m/(N s²)", unicode.unit("m/(N s^2)"));
    }

    @Test
    void fallsBackToAsciiWhereTheOutputCannotEncodeTheSymbols() {
        // Java 17 under LANG=C encodes standard output in US-ASCII (common practice: the POSIX locale's charset)
        assertEquals(TextStyle.ASCII, TextStyle.forCharset(StandardCharsets.US_ASCII), "LANG=C");
        assertEquals(TextStyle.UNICODE, TextStyle.forCharset(StandardCharsets.UTF_8), "a UTF-8 terminal");
        assertEquals(new TextStyle("±", true, false), TextStyle.forCharset(Charset.forName("windows-1252")),
                "WinAnsi has ±, ² and ³ but no superscript minus (PDF 32000-1 annex D, from memory)");
        assertEquals(new TextStyle("±", true, false), TextStyle.forStandardPdfFonts());
        assertEquals("(614 ± 61)e-6 N m²", new QuantityFormat(TextStyle.forStandardPdfFonts())
                .withUncertainty(6.1432e-4, 6.14e-5, "N m^2"), "the report's fonts");
    }

    @Test
    void writesEveryUncertaintyWithTwoSignificantDigits() {
        // GUM 7.2.6 (from memory): "at most two significant digits"; we always give two, so that 0.8 and 2 read
        // alike and the value keeps the same number of decimals whatever the uncertainty's second digit is.
        assertEquals("(151.20 ± 0.80) N", unicode.withUncertainty(151.2, 0.8, "N"), "0.8 written as 0.80");
        assertEquals("(135.0 ± 2.0) N", unicode.withUncertainty(135, 2, "N"), "2 written as 2.0");
        assertEquals("0.00200 ± 0.00020", unicode.withUncertainty(0.002, 0.0002, ""), "2e-4 written as 0.00020");
        assertEquals("0.80", unicode.uncertainty(0.8, ""));
    }

    @Test
    void roundsTheFiguresOfTheWorkbenchAsGum726Asks() {
        // GUM 7.2.6 (from memory): u to two significant figures, the value to the same decimal place.
        assertEquals("(228.410 ± 0.012) Hz", unicode.withUncertainty(228.41, 0.0123, "Hz"), "GUM 7.2.6");
        assertEquals("(225.565 ± 0.026) Hz", unicode.withUncertainty(225.565, 0.0262257, "Hz"), "GUM 7.2.6");
        assertEquals("(146.5 ± 2.9) N", unicode.withUncertainty(146.517, 2.93058, "N"), "GUM 7.2.6");
        assertEquals("382.6 ± 5.0", unicode.withUncertainty(382.57, 4.99, ""), "GUM 7.2.6, the carry to 5.0");
        assertEquals("470 ± 190", unicode.withUncertainty(466.6, 190.3, ""), "GUM 7.2.6, tens place");
        assertEquals("-874 ± 55", unicode.withUncertainty(-874.11, 55.2, ""), "GUM 7.2.6, negative");
        assertEquals("0.003488 ± 0.000032", unicode.withUncertainty(0.0034875, 3.2e-5, ""), "GUM 7.2.6, half away");
        assertEquals("(100 ± 37) × 10⁻⁶", unicode.withUncertainty(9.957e-5, 3.7e-5, ""),
                "GUM 7.2.6 with the carry into engineering notation");
        assertEquals("(15.00 ± 0.20) × 10⁶", unicode.withUncertainty(1.5e7, 2.0e5, ""), "a large value");
        assertEquals("99.57 × 10⁻⁶", unicode.number(9.957e-5), "a small value without uncertainty");
        assertEquals("215", unicode.number(215.0));
        assertEquals("0.001", unicode.number(0.001));
    }

    @Test
    void putsASentenceWrittenInUnicodeIntoTheOutputsStyle() {
        String sentence = "bending stiffness EI = (614 ± 61) × 10⁻⁶ N m² (k = 2)";
        assertEquals("bending stiffness EI = (614 +/- 61)e-6 N m^2 (k = 2)", ascii.inStyle(sentence), "LANG=C");
        assertEquals(ascii.withUncertainty(6.1432e-4, 6.14e-5, "N m^2"), ascii.inStyle(unicode.withUncertainty(6.1432e-4,
                6.14e-5, "N m^2")), "the same text as written in ASCII from the start");
        assertEquals("(614 ± 61)e-6 N m²", new QuantityFormat(TextStyle.forStandardPdfFonts())
                .inStyle("(614 ± 61) × 10⁻⁶ N m²"), "the report's fonts");
        assertEquals("1.5e9 and 2e12", ascii.inStyle(unicode.number(1.5e9) + " and " + unicode.number(2e12)));
        assertEquals(sentence, unicode.inStyle(sentence), "Unicode stays Unicode");
        assertEquals("", unicode.inStyle(null));
    }
}
