package org.tautline.app.report;

import java.awt.Color;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;

/**
 * One section of the report, laid out whole: its heading and content are measured first, and the section starts on
 * a new page unless it fits below the cursor (a section taller than a page starts with at least its heading and
 * first lines together). A wrapped paragraph is never split across pages.
 */
final class Section {
    /** Content kept with the heading when a section is taller than a page. */
    private static final float KEEP_WITH_HEADING = 80;

    private interface Item {
        float height(PageWriter w);

        void draw(PageWriter w);
    }

    private final String title;
    private final List<Item> items = new ArrayList<>();

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

    Section row(String[] cells, float[] columnsPt, boolean header) {
        items.add(new Item() {
            public float height(PageWriter w) {
                return 11;
            }

            public void draw(PageWriter w) {
                w.row(cells, columnsPt, header);
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
