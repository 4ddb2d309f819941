package org.tautline.app.ui.chart;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;

import org.jfree.chart.axis.LogarithmicAxis;
import org.jfree.chart.axis.NumberTick;
import org.jfree.chart.axis.TickType;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.TextAnchor;

/** A logarithmic axis with the ticks and labels of {@link LogTicks}: labelled between the decades, too. */
public final class LogScaleAxis extends LogarithmicAxis {
    private static final long serialVersionUID = 1L;

    /** @param label the axis label, with its unit */
    public LogScaleAxis(String label) {
        super(label);
        setStrictValuesFlag(false);
        setAutoRangeIncludesZero(false);
        setMinorTickMarksVisible(true);
    }

    @Override
    @SuppressWarnings("rawtypes")
    protected List refreshTicksHorizontal(Graphics2D g2, Rectangle2D dataArea, RectangleEdge edge) {
        TextAnchor anchor = edge == RectangleEdge.TOP ? TextAnchor.BOTTOM_CENTER : TextAnchor.TOP_CENTER;
        return ticks(anchor);
    }

    @Override
    @SuppressWarnings("rawtypes")
    protected List refreshTicksVertical(Graphics2D g2, Rectangle2D dataArea, RectangleEdge edge) {
        TextAnchor anchor = edge == RectangleEdge.RIGHT ? TextAnchor.CENTER_LEFT : TextAnchor.CENTER_RIGHT;
        return ticks(anchor);
    }

    private List<NumberTick> ticks(TextAnchor anchor) {
        List<NumberTick> out = new ArrayList<>();
        for (LogTicks.Tick t : LogTicks.between(getLowerBound(), getUpperBound())) {
            out.add(new NumberTick(t.labelled() ? TickType.MAJOR : TickType.MINOR, t.value(), t.label(), anchor,
                    TextAnchor.CENTER, 0.0));
        }
        return out;
    }
}
