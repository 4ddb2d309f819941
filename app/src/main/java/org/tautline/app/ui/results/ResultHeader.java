package org.tautline.app.ui.results;

import java.awt.Font;
import java.util.Optional;

import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JTextArea;
import javax.swing.UIManager;

import net.miginfocom.swing.MigLayout;
import org.tautline.app.qualify.QualificationResult;

/**
 * The top of the results screen: the verdict banner (the outcome in words and colour, and its first reason), the run
 * header (specimen, when the run was made, the rig), and a note when the result on show is not current.
 * Build and use on the event thread.
 */
final class ResultHeader {
    private final JPanel component = new JPanel(new MigLayout("insets 6 8 2 8, fillx, wrap 1, gapy 4, hidemode 3", "[grow,fill]"));
    private final JPanel banner = new JPanel(new MigLayout("insets 8 14 8 14, fillx", "[]18[grow,fill]"));
    private final JLabel headline = new JLabel();
    private final JTextArea reason = new JTextArea();
    private final JLabel run = new JLabel();
    private final JTextArea staleNote = new JTextArea();
    private VerdictSummary summary;

    ResultHeader() {
        banner.setName("verdictBanner");
        banner.setOpaque(true);
        headline.setName("verdictHeadline");
        reason.setName("verdictReason");
        run.setName("runHeader");
        staleNote.setName("staleNote");
        for (JTextArea t : new JTextArea[] {reason, staleNote}) {
            t.setEditable(false);
            t.setLineWrap(true);
            t.setWrapStyleWord(true);
            t.setOpaque(false);
            t.setFocusable(false);
            t.setBorder(null);
            t.setMargin(new java.awt.Insets(0, 0, 0, 0));
        }
        banner.add(headline);
        banner.add(reason, "wmin 0");
        component.add(banner);
        // The run line may be longer than the window: it is cut with an ellipsis (the whole of it in the tooltip) so that
        // it does not widen the column the wrapped notes are laid out in.
        component.add(run, "wmin 0");
        component.add(staleNote, "wmin 0");
        staleNote.setVisible(false);
        fonts();
        component.setVisible(false);
    }

    JComponent component() {
        return component;
    }

    /** Shows a current result. */
    void show(QualificationResult result, ResultOrigin origin) {
        summary = VerdictSummary.of(result);
        run.setText("Specimen " + result.specimen().id() + "     " + capitalised(origin.how()) + " " + origin.when()
                + "     Rig " + origin.rig());
        run.setToolTipText(run.getText());
        staleNote.setVisible(false);
        paint(VerdictColours.of(summary.outcome()), summary.headline(), summary.firstReason());
        component.setVisible(true);
        component.revalidate();
    }

    /**
     * Marks the result on show as not current.
     *
     * @param note why, in full sentences
     */
    void stale(String note) {
        if (summary == null) {
            return;
        }
        staleNote.setText(note);
        staleNote.setVisible(true);
        paint(VerdictColours.STALE, "NOT CURRENT", "Verdict when it was made: "
                + summary.headline().toLowerCase(java.util.Locale.ROOT) + ". " + summary.firstReason());
        component.revalidate();
    }

    /** Hides the header, for a screen with no result. */
    void clear() {
        summary = null;
        component.setVisible(false);
    }

    /** @return the outcome of the result on show, empty without one or without a verdict */
    Optional<org.tautline.analysis.verdict.Outcome> outcome() {
        return summary == null ? Optional.empty() : summary.outcome();
    }

    private void paint(VerdictColours colours, String head, String why) {
        banner.setBackground(colours.background());
        headline.setForeground(colours.text());
        reason.setForeground(colours.text());
        headline.setText(head);
        reason.setText(why);
    }

    /** The headline large and bold, in the look's font (called again when the look changes). */
    void fonts() {
        Font base = UIManager.getFont("Label.font");
        if (base != null) {
            headline.setFont(base.deriveFont(Font.BOLD, base.getSize2D() * 2f));
            reason.setFont(base.deriveFont(base.getSize2D() * 1.1f));
            staleNote.setFont(base.deriveFont(Font.BOLD));
            run.setFont(base);
        }
    }

    private static String capitalised(String text) {
        return text.isEmpty() ? text : Character.toUpperCase(text.charAt(0)) + text.substring(1);
    }
}
