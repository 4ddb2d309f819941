package org.tautline.app.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Pattern;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.analysis.qualify.Assessment;
import org.tautline.analysis.qualify.QualifiedMode;
import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.ui.results.SyntheticWire;

/** A modes table longer than a page: every page it runs onto starts with its header row. */
class ModesTableTest {
    /** More rows than an A4 page holds at 11 pt a row (about 67). */
    private static final int MODES = 150;
    /** One row of the modes table as PDFBox extracts it: the harmonic number, then "-" for a single polarisation. */
    private static final Pattern MODE_ROW = Pattern.compile("^\\d+ - .*");

    /** The invented wire's result with its modes repeated under harmonic numbers 1 to {@value #MODES}. */
    private static QualificationResult manyModes() {
        Assessment a = SyntheticWire.qualified().assessment();
        List<QualifiedMode> many = new ArrayList<>();
        for (int i = 0; i < MODES; i++) {
            many.add(new QualifiedMode(a.modes().get(i % a.modes().size()).fitted(), i + 1, 0));
        }
        return new QualificationResult(new Assessment(a.request(), a.receptance(), a.synthesized(), a.modal(), many,
                a.harmonics(), a.tension(), a.participation(), a.measurements(), a.verdict(), a.cautions()),
                Optional.empty(), 0);
    }

    @Test
    void everyPageTheModesTableRunsOntoHoldsItsHeader(@TempDir Path dir) throws Exception {
        Path pdf = dir.resolve("report.pdf");
        QualificationReport.write(new RunDirectory(dir, manyModes(), Map.of(), Optional.empty()),
                new ReportInfo("", ReportInfo.SOFTWARE, Instant.parse("2026-11-03T10:00:00Z")), "", List.of(), pdf);
        try (PDDocument document = Loader.loadPDF(pdf.toFile())) {
            PDFTextStripper stripper = new PDFTextStripper();
            int rows = 0;
            int pagesWithRows = 0;
            for (int page = 1; page <= document.getNumberOfPages(); page++) {
                stripper.setStartPage(page);
                stripper.setEndPage(page);
                List<String> lines = stripper.getText(document).lines().toList();
                long onPage = lines.stream().filter(l -> MODE_ROW.matcher(l).matches()).count();
                if (onPage == 0) {
                    continue;
                }
                rows += (int) onPage;
                pagesWithRows++;
                int header = indexOf(lines, "n pol. f (Hz) u (Hz) damping ratio u A (1/kg) u (1/kg)");
                int firstRow = indexOf(lines, MODE_ROW);
                assertTrue(header >= 0 && header < firstRow, "page " + page + " starts its rows under the header:\n"
                        + String.join("\n", lines));
                if (pagesWithRows > 1) {
                    assertEquals("Modes (estimate and standard error) (continued)", lines.get(header - 1),
                            "page " + page + " says the table goes on");
                }
            }
            assertEquals(MODES, rows, "every mode has its row, none twice");
            assertTrue(pagesWithRows >= 3, "150 rows run over three pages at least, got " + pagesWithRows);
        }
    }

    private static int indexOf(List<String> lines, String text) {
        return lines.indexOf(text);
    }

    private static int indexOf(List<String> lines, Pattern p) {
        for (int i = 0; i < lines.size(); i++) {
            if (p.matcher(lines.get(i)).matches()) {
                return i;
            }
        }
        return -1;
    }
}
