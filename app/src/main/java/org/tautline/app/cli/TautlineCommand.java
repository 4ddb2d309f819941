package org.tautline.app.cli;

import picocli.CommandLine.Command;

/** The top-level command; its subcommands do the work. */
@Command(name = "tautline", mixinStandardHelpOptions = true, version = "Tautline 0.1.0",
        description = "Vibration qualification of tensioned strings, wires and belts."
                + " With no command, opens the workbench window.",
        subcommands = {DemoCommand.class, FrfCommand.class, FitCommand.class, BenchCommand.class, RigsCommand.class, VirtualRigCommand.class,
                SweepCommand.class, ResumeCommand.class, ReportCommand.class, ExportCommand.class, LotCommand.class})
final class TautlineCommand implements Runnable {
    @picocli.CommandLine.Spec
    private picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }
}
