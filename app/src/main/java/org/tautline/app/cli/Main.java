package org.tautline.app.cli;

import java.awt.GraphicsEnvironment;

import org.tautline.app.ui.Workbench;
import picocli.CommandLine;

/** The {@code tautline} entry point: the window with no arguments, a command otherwise. */
public final class Main {
    private Main() {
    }

    /**
     * Runs a command, or opens the workbench when there are no arguments.
     *
     * @param args command line
     */
    public static void main(String[] args) {
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
