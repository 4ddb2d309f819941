package org.tautline.app.bench;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Callable;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.tautline.app.ui.DemoSweepInWindow;
import org.tautline.app.ui.EventThreadDelays;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code tautline bench ui}: how responsive the workbench's event thread stays while the demo sweep runs in the window
 * and its result is fitted and shown. Prints figures; passes or fails on nothing.
 */
@Command(name = "ui", mixinStandardHelpOptions = true,
        description = "Run the demo sweep in the workbench window on the simulated rig (connect, start, accept the"
                + " cautions, wait for the verdict) while a watchdog posts a probe to the Swing event thread every period"
                + " and times how long each waits: prints the probes, the delay quantiles, the longest delay, the longest"
                + " stall that was the event thread's own doing and where the event thread was then. Needs a display"
                + " (xvfb-run on a server). Common practice aims at no stall over 100 ms.")
public final class UiBenchmark implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Option(names = "--steps", paramLabel = "N", defaultValue = "1061",
            description = "Steps of the sweep (default: ${DEFAULT-VALUE}, the demo plan's).")
    private int steps;

    @Option(names = "--period", paramLabel = "MS", defaultValue = "20",
            description = "Milliseconds between probes (default: ${DEFAULT-VALUE}).")
    private long periodMs;

    @Option(names = "--json", description = "Print the figures as JSON.")
    private boolean json;

    @Override
    public Integer call() throws Exception {
        PrintWriter err = spec.commandLine().getErr();
        DemoSweepInWindow.Figures f = DemoSweepInWindow.run(steps, periodMs, what -> {
            err.println("bench ui: " + what);
            err.flush();
        });
        PrintWriter out = spec.commandLine().getOut();
        out.print(json ? json(f) : text(f));
        out.flush();
        return 0;
    }

    /**
     * @param f the figures
     * @return them in lines for people
     */
    public static String text(DemoSweepInWindow.Figures f) {
        EventThreadDelays d = f.delays();
        return String.format(Locale.ROOT, "ui: demo sweep of %d steps in the window, %.1f s from Start to the verdict;"
                        + " %d probes every %d ms%n"
                        + "  probe delay: median %.1f ms, 90 %% %.1f ms, 99 %% %.1f ms, 99.9 %% %.1f ms, longest %.1f ms%n"
                        + "  longest stall of the event thread itself: %.1f ms; probes seen still waiting after 3 periods:"
                        + " %d%n%s",
                f.steps(), f.wallS(), d.probes(), f.periodMs(), d.delayQuantileMs(0.5), d.delayQuantileMs(0.9),
                d.delayQuantileMs(0.99), d.delayQuantileMs(0.999), d.longestDelayMs(), d.longestStallMs(),
                d.busySightings(), d.stackAtLongestStall().isEmpty() ? ""
                        : "  the event thread during the longest stall (innermost frames):" + firstFrames(d.stackAtLongestStall(), 12)
                        + "\n");
    }

    /** The first frames of a stack written one per line, and how many more there were. */
    private static String firstFrames(String stack, int count) {
        String[] lines = stack.split("\n");
        if (lines.length <= count + 1) {
            return stack;
        }
        return String.join("\n", java.util.Arrays.copyOf(lines, count + 1)) + "\n  ... " + (lines.length - count - 1)
                + " more frames (all of them with --json)";
    }

    private static String json(DemoSweepInWindow.Figures f) throws Exception {
        ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
        EventThreadDelays d = f.delays();
        ObjectNode node = mapper.createObjectNode();
        node.put("benchmark", "ui");
        node.put("steps", f.steps());
        node.put("wallTimeS", f.wallS());
        node.put("probePeriodMs", f.periodMs());
        node.put("probes", d.probes());
        finite(node, "medianDelayMs", d.delayQuantileMs(0.5));
        finite(node, "p90DelayMs", d.delayQuantileMs(0.9));
        finite(node, "p99DelayMs", d.delayQuantileMs(0.99));
        finite(node, "p999DelayMs", d.delayQuantileMs(0.999));
        node.put("longestDelayMs", d.longestDelayMs());
        node.put("longestStallMs", d.longestStallMs());
        node.put("probesSeenWaiting", d.busySightings());
        node.put("stackAtLongestStall", d.stackAtLongestStall());
        return mapper.writeValueAsString(node) + System.lineSeparator();
    }

    /** JSON has no NaN: a quantile of no probes is written as null. */
    private static void finite(ObjectNode node, String key, double value) {
        if (Double.isFinite(value)) {
            node.put(key, value);
        } else {
            node.putNull(key);
        }
    }
}
