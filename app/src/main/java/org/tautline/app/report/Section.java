package org.tautline.app.report;

import java.awt.Color;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;

/**
 * One section of the report, laid out whole: its heading and content are measured first, and the section starts on
 * a new page unless it fits below the cursor (a section taller than a page starts with at least its heading and
 * first lines together). A wrapped paragraph is never split across pages; a table that runs onto a new page has its
 * header row written again there.
 */
final class Section {
    /** Content kept with the heading when a section is taller than a page. */
    private static final float KEEP_WITH_HEADING = 80;

    private interface Item {
        float height(PageWriter w);

        void draw(PageWriter w);
    }

    /** The height of one table row, pt. */
    private static final float ROW_HEIGHT = 11;

    private final String title;
    private final List<Item> items = new ArrayList<>();
    /** The header row of the table being built, null before the first. */
    private String[] tableHeader;
    private float[] tableColumns;

    /** @param title the heading; empty for a block without one */
    Section(String title) {
        this.title = title;
    }

    Section line(String content, float size) {
        items.add(new Item() {
            public float height(PageWriter w) {
                return w.lineHeight(content, size);
            }

            public void draw(PageWriter w) {
                w.keep(height(w));
                w.line(content, size);
            }
        });
        return this;
    }

    Section boldLine(String content, float size, Color colour) {
        items.add(new Item() {
            public float height(PageWriter w) {
                return w.boldLineHeight(content, size);
            }

            public void draw(PageWriter w) {
                w.keep(height(w));
                w.boldLine(content, size, colour);
            }
        });
        return this;
    }

    /**
     * A table row. A header row starts a table: it is kept on a page with the first row below it, and when a later row
     * of the table falls on a new page the header is written again at the top of that page, under the section's title
     * marked "(continued)".
     */
    Section row(String[] cells, float[] columnsPt, boolean header) {
        String[] copy = cells.clone();
        if (header) {
            tableHeader = copy;
            tableColumns = columnsPt;
        }
        String[] repeated = header ? null : tableHeader;
        float[] repeatedColumns = tableColumns;
        items.add(new Item() {
            public float height(PageWriter w) {
                return ROW_HEIGHT;
            }

            public void draw(PageWriter w) {
                if (header) {
                    w.keep(2 * ROW_HEIGHT);
                } else if (repeated != null && w.remaining() < ROW_HEIGHT) {
                    w.newPage();
                    if (!title.isEmpty()) {
                        w.line(title + " (continued)", 8);
                    }
                    w.row(repeated, repeatedColumns, true);
                }
                w.row(copy, columnsPt, header);
            }
        });
        return this;
    }

    Section gap(float pt) {
        items.add(new Item() {
            public float height(PageWriter w) {
                return pt;
            }

            public void draw(PageWriter w) {
                w.gap(pt);
            }
        });
        return this;
    }

    Section chart(PdfChart chart, float heightPt) {
        items.add(new Item() {
            public float height(PageWriter w) {
                return heightPt;
            }

            public void draw(PageWriter w) {
                try {
                    chart.draw(w, heightPt);
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            }
        });
        return this;
    }

    /** Lays the section out, whole where it fits on a page. */
    void write(PageWriter w) {
        float heading = title.isEmpty() ? 0 : PageWriter.HEADING_HEIGHT;
        float total = heading;
        float opening = heading;
        for (Item item : items) {
            float h = item.height(w);
            total += h;
            if (opening - heading < KEEP_WITH_HEADING) {
                opening += h;
            }
        }
        w.keep(total <= PageWriter.PAGE_HEIGHT ? total : Math.min(opening, PageWriter.PAGE_HEIGHT));
        if (!title.isEmpty()) {
            w.heading(title);
        }
        items.forEach(item -> item.draw(w));
    }
}
