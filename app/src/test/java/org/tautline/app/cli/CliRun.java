package org.tautline.app.cli;

import java.io.PrintWriter;
import java.io.StringWriter;

import picocli.CommandLine;

/**
 * One run of the command line in the test's JVM, with what it printed.
 *
 * @param exitCode the exit code the command returned
 * @param out what it printed on standard output
 * @param err what it printed on standard error
 */
record CliRun(int exitCode, String out, String err) {

    static CliRun of(String... args) {
        CommandLine cl = Main.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        int code = cl.execute(args);
        return new CliRun(code, out.toString(), err.toString());
    }
}
