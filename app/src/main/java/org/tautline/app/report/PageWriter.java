package org.tautline.app.report;

import java.awt.Color;
import java.io.IOException;
import java.io.UncheckedIOException;

import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.PDPageContentStream.AppendMode;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDType1Font;
import org.apache.pdfbox.pdmodel.font.Standard14Fonts;

/**
 * Lays text, tables and boxes down A4 pages top to bottom, starting a new page when one is full; when closed, it
 * writes "page x of y" in every page's footer.
 */
final class PageWriter implements AutoCloseable {
    static final float MARGIN = 50f;
    static final float WIDTH = PDRectangle.A4.getWidth() - 2 * MARGIN;
    /** The height a page offers between its margins. */
    static final float PAGE_HEIGHT = PDRectangle.A4.getHeight() - 2 * MARGIN;
    static final float HEADING_HEIGHT = 24;
    final PDType1Font regular = new PDType1Font(Standard14Fonts.FontName.HELVETICA);
    final PDType1Font bold = new PDType1Font(Standard14Fonts.FontName.HELVETICA_BOLD);
    private final PDDocument document;
    private final String footer;
    private PDPageContentStream stream;
    private float y;

    PageWriter(PDDocument document, String footer) {
        this.document = document;
        this.footer = footer;
        newPage();
    }

    void newPage() {
        try {
            if (stream != null) {
                stream.close();
            }
            PDPage page = new PDPage(PDRectangle.A4);
            document.addPage(page);
            stream = new PDPageContentStream(document, page);
            y = PDRectangle.A4.getHeight() - MARGIN;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    PDPageContentStream stream() {
        return stream;
    }

    /** Makes room for {@code heightPt} below the cursor, starting a new page if needed; returns the box's top. */
    float reserve(float heightPt) {
        if (y - heightPt < MARGIN) {
            newPage();
        }
        float top = y;
        y -= heightPt;
        return top;
    }

    /** Starts a new page unless {@code heightPt} fits below the cursor, to keep a heading with what follows. */
    void keep(float heightPt) {
        if (y - heightPt < MARGIN) {
            newPage();
        }
    }

    void gap(float pt) {
        y -= pt;
    }

    /** @return the height left on this page below the cursor */
    float remaining() {
        return y - MARGIN;
    }

    void heading(String title) {
        reserve(8);
        float top = reserve(16);
        text(bold, 12, MARGIN, top - 12, title, Color.BLACK);
    }

    /** @return the height {@link #line} takes for this text, wrapped */
    float lineHeight(String content, float size) {
        return wrap(content, size, WIDTH).size() * (size + 3);
    }

    void line(String content, float size) {
        for (String part : wrap(content, size, WIDTH)) {
            float top = reserve(size + 3);
            text(regular, size, MARGIN, top - size, part, Color.BLACK);
        }
    }

    void boldLine(String content, float size, Color colour) {
        for (String part : wrap(bold, content, size, WIDTH)) {
            float top = reserve(size + 4);
            text(bold, size, MARGIN, top - size, part, colour);
        }
    }

    /** @return the height {@link #boldLine} takes for this text, wrapped */
    float boldLineHeight(String content, float size) {
        return wrap(bold, content, size, WIDTH).size() * (size + 4);
    }

    /** One table row; {@code columnsPt} are the left edges; cells after the first are right-aligned to the next edge. */
    void row(String[] cells, float[] columnsPt, boolean header) {
        float size = 8;
        float top = reserve(size + 3);
        PDType1Font font = header ? bold : regular;
        for (int i = 0; i < cells.length; i++) {
            float left = MARGIN + columnsPt[i];
            float right = i + 1 < columnsPt.length ? MARGIN + columnsPt[i + 1] - 4 : MARGIN + WIDTH;
            String cell = clean(cells[i]);
            float x = i == 0 ? left : right - width(font, size, cell);
            text(font, size, x, top - size, cell, Color.BLACK);
        }
    }

    void text(PDType1Font font, float size, float x, float baseline, String content, Color colour) {
        try {
            stream.beginText();
            stream.setNonStrokingColor(colour);
            stream.setFont(font, size);
            stream.newLineAtOffset(x, baseline);
            stream.showText(clean(content));
            stream.endText();
            stream.setNonStrokingColor(Color.BLACK);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    float width(PDType1Font font, float size, String content) {
        try {
            return font.getStringWidth(clean(content)) / 1000f * size;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private java.util.List<String> wrap(String content, float size, float widthPt) {
        return wrap(regular, content, size, widthPt);
    }

    private java.util.List<String> wrap(PDType1Font font, String content, float size, float widthPt) {
        java.util.List<String> lines = new java.util.ArrayList<>();
        StringBuilder current = new StringBuilder();
        for (String word : clean(content).split(" ")) {
            String candidate = current.length() == 0 ? word : current + " " + word;
            if (current.length() > 0 && width(font, size, candidate) > widthPt) {
                lines.add(current.toString());
                current = new StringBuilder(word);
            } else {
                current = new StringBuilder(candidate);
            }
        }
        lines.add(current.toString());
        return lines;
    }

    /**
     * Puts text into the report's style ({@link ReportText#FORMAT}: "× 10⁻⁶" as "e-6") and replaces the other
     * characters the standard fonts cannot show (WinAnsi) with close ASCII.
     */
    String clean(String content) {
        StringBuilder out = new StringBuilder();
        for (char c : ReportText.FORMAT.inStyle(content).replace('\u2212', '-').replace("\u03b6", "zeta").replace("\u03bc", "mu")
                .replace('\t', ' ').replace('\n', ' ').toCharArray()) {
            try {
                regular.encode(String.valueOf(c));
                out.append(c);
            } catch (IOException | IllegalArgumentException e) {
                out.append('?');
            }
        }
        return out.toString();
    }

    /** Writes the footer, with "page x of y", on every page, then closes the last page. */
    @Override
    public void close() throws IOException {
        stream.close();
        int pages = document.getNumberOfPages();
        for (int i = 0; i < pages; i++) {
            PDPage page = document.getPage(i);
            try (PDPageContentStream footerStream = new PDPageContentStream(document, page, AppendMode.APPEND, true, true)) {
                stream = footerStream;
                String number = "page " + (i + 1) + " of " + pages;
                text(regular, 7, MARGIN, 28, footer, Color.GRAY);
                text(regular, 7, MARGIN + WIDTH - width(regular, 7, number), 28, number, Color.GRAY);
            }
        }
    }
}
