package org.tautline.app.cli;

import java.awt.GraphicsEnvironment;
import java.util.logging.Level;
import java.util.logging.Logger;

import org.tautline.app.ui.Workbench;
import picocli.CommandLine;

/** The {@code tautline} entry point: the window with no arguments, a command otherwise. */
public final class Main {
    /** Held so that the level set on it is not lost when the logger would otherwise be collected. */
    private static final Logger PDFBOX_FONT_LOGGER = Logger.getLogger("org.apache.pdfbox.pdmodel.font");
    private Main() {
    }

    /**
     * Runs a command, or opens the workbench when there are no arguments.
     *
     * @param args command line
     */
    public static void main(String[] args) {
        quietLibraryLogging();
        if (args.length == 0) {
            if (GraphicsEnvironment.isHeadless()) {
                System.err.println("tautline: no display is available for the window."
                        + " Run 'tautline demo' for the headless qualification, or 'tautline --help' for the commands.");
                System.exit(2);
            }
            Workbench.open();
            return;
        }
        System.exit(commandLine().execute(args));
    }

    /**
     * Keeps PDFBox's notice that it draws the report's standard Helvetica with a metric-compatible system font
     * off the terminal: it is expected on every machine without Adobe's fonts and says nothing the user can act on.
     */
    private static void quietLibraryLogging() {
        PDFBOX_FONT_LOGGER.setLevel(Level.SEVERE);
    }

    /** @return the command line with every subcommand, exceptions shown as messages */
    static CommandLine commandLine() {
        CommandLine commandLine = new CommandLine(new TautlineCommand());
        commandLine.setExecutionExceptionHandler((exception, cmd, parseResult) -> {
            cmd.getErr().println("tautline: " + exception.getMessage());
            return 1;
        });
        return commandLine;
    }
}
