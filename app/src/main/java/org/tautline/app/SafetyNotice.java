package org.tautline.app;

import java.util.List;

/** The cautions shown before any excitation, in the command line and in the workbench. */
public final class SafetyNotice {
    private SafetyNotice() {
    }

    /** @return the cautions, one sentence each, most serious first */
    public static List<String> cautions() {
        return List.of(
                "A tensioned wire that breaks can whip and cut: keep the guard closed, wear eye protection, and keep"
                        + " hands and face out of the line of the specimen.",
                "Use a specimen, clamps and tensioner rated for the test tension.",
                "The shaker amplifier carries dangerous voltages: switch it off before touching the rig, the stinger"
                        + " or the wiring.",
                "Excitation stops on any fault, limit or cancel, but the amplifier stays powered: use its own switch"
                        + " to make the rig safe.",
                "Your local codes and your lab's own procedures take precedence over these notes.");
    }

    /**
     * The cautions as HTML for a dialog: a heading and a bulleted list, wrapped at a fixed width.
     *
     * @param simulated true when the rig is the simulated one (no hardware is driven)
     * @return an {@code <html>} string for a Swing label or option pane
     */
    public static String asHtml(boolean simulated) {
        StringBuilder html = new StringBuilder("<html><body style='width: 420px'><b>Before any excitation</b><ul>");
        for (String caution : cautions()) {
            html.append("<li>").append(caution).append("</li>");
        }
        html.append("</ul>");
        if (simulated) {
            html.append("<i>This run uses the simulated rig: no hardware is driven.</i>");
        }
        return html.append("</body></html>").toString();
    }

    /**
     * The cautions as a block of text.
     *
     * @param simulated true when the rig is the simulated one (no hardware is driven)
     * @return a heading and the cautions, one per line
     */
    public static String asText(boolean simulated) {
        StringBuilder text = new StringBuilder("SAFETY - before any excitation:\n");
        for (String caution : cautions()) {
            text.append("  * ").append(caution).append('\n');
        }
        if (simulated) {
            text.append("  (This run uses the simulated rig: no hardware is driven.)\n");
        }
        return text.toString();
    }
}
