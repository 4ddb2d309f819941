package org.tautline.app.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.format.QuantityFormat;
import org.tautline.analysis.format.Rounded;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfCsvReader;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.ModalEstimate;
import org.tautline.analysis.modal.ModalEstimator;
import org.tautline.analysis.specimen.LinearityResult;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.verdict.Specification;
import org.tautline.app.qualify.Qualification;
import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.qualify.ResultText;
import org.tautline.app.report.LevelCheckFile;
import org.tautline.app.report.RunDirectory;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code tautline fit}: the modal model of an FRF file, and with a specimen its physics and verdict. */
@Command(name = "fit", mixinStandardHelpOptions = true,
        description = "Fit a damped modal model to an FRF CSV file: find the resonances over a range of model orders and"
                + " keep those that stay put (the stable ones), fit each mode's strength with the resonances held fixed,"
                + " then refine everything together to get a standard error for every figure. With --specimen, also number the"
                + " harmonics and read tension, bending stiffness and positions; with --spec, judge them. The level"
                + " check needs the rig: its figure is read from the run's result.json beside the FRF file (or"
                + " --level-check FILE) when there is one.",
        exitCodeListHeading = "%nExit status:%n",
        exitCodeList = {"0:pass, or no --spec given", "1:an error (a file that cannot be read, a bad option)",
                "10:fail", "11:not determinable"})
final class FitCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Option(names = "--frf", required = true, paramLabel = "FRF.csv", description = "The FRF to fit (FRF CSV).")
    private Path frfFile;

    @Option(names = "--band", paramLabel = "F1:F2", description = "Fit only between F1 and F2 Hz.")
    private String band;

    @Option(names = "--complex-modes", description = "Fit complex modal constants (non-proportional damping).")
    private boolean complexModes;

    @Mixin
    private FitInputs stated;

    @Option(names = "--level-check", paramLabel = "RESULT.json",
            description = "The run's result.json holding the level check (default: result.json beside the FRF file,"
                    + " when there is one).")
    private Path levelCheckFile;

    @Option(names = "--json", description = "Print the result as JSON.")
    private boolean json;

    @Override
    public Integer call() throws IOException {
        Frf frf = FrfCsvReader.read(frfFile).frf();
        ModalEstimator estimator = ModalEstimator.defaults().withComplexModes(complexModes);
        if (band != null) {
            double[] limits = parseBand(band);
            estimator = estimator.withBand(limits[0], limits[1]);
        }
        Optional<FitInputs.Stated> given = stated.read();
        PrintWriter out = spec.commandLine().getOut();
        if (given.isEmpty()) {
            ModalEstimate estimate = estimator.estimate(frf);
            out.print(json ? ResultJson.MAPPER.writeValueAsString(modalJson(estimate)) + "\n"
                    : modalText(estimate, QuantityFormat.forStandardOutput()));
        } else {
            Specimen specimen = given.get().specimen();
            Optional<Specification> specification = given.get().specification();
            QualificationResult result = Qualification.analyse(specimen, frf, Optional.empty(), estimator, specification,
                    System.nanoTime());
            Path recorded = levelCheckFile != null ? levelCheckFile
                    : frfFile.toAbsolutePath().resolveSibling(RunDirectory.RESULT);
            if (levelCheckFile != null && !Files.isRegularFile(levelCheckFile)) {
                throw new AnalysisException("--level-check " + levelCheckFile + ": no such file; expected a run's"
                        + " result.json");
            }
            Optional<LinearityResult> linearity = LevelCheckFile.read(recorded);
            if (linearity.isPresent()) {
                result = Qualification.withLinearity(result, linearity.get(), specification);
                spec.commandLine().getErr().println("tautline: the level check (it needs the rig) was read from "
                        + recorded);
            }
            out.print(json ? ResultJson.MAPPER.writeValueAsString(ResultJson.result(result)) + "\n"
                    : ResultText.format(result, Optional.empty()));
            out.flush();
            return ExitCodes.of(result.verdict());
        }
        out.flush();
        return ExitCodes.OK;
    }

    static double[] parseBand(String text) {
        String[] parts = text.split(":");
        try {
            if (parts.length == 2) {
                double low = Double.parseDouble(parts[0].strip());
                double high = Double.parseDouble(parts[1].strip());
                if (low >= 0 && high > low) {
                    return new double[] {low, high};
                }
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new AnalysisException("--band '" + text + "': expected F1:F2 in Hz with 0 <= F1 < F2, for example 150:1500");
    }

    private static ObjectNode modalJson(ModalEstimate estimate) {
        ObjectNode root = ResultJson.MAPPER.createObjectNode();
        ArrayNode modes = root.putArray("modes");
        for (FittedMode m : estimate.modes()) {
            modes.add(ResultJson.fittedMode(m));
        }
        ResultJson.modal(root, estimate);
        return root;
    }

    static String modalText(ModalEstimate estimate, QuantityFormat f) {
        String pm = f.style().plusMinus();
        StringBuilder out = new StringBuilder(String.format(Locale.ROOT, "Modes in %s to %s (estimate %s standard error)%n",
                f.value(estimate.bandLowHz(), "Hz"), f.value(estimate.bandHighHz(), "Hz"), pm));
        out.append(String.format(Locale.ROOT, "%14s %9s %13s %9s %12s %12s%n", "f (Hz)", pm, "damping ratio", pm,
                "A re (1/kg)", "A im (1/kg)"));
        for (FittedMode m : estimate.modes()) {
            String[] freq = cells(f, m.mode().frequencyHz(), m.frequencyStdHz());
            String[] zeta = cells(f, m.mode().dampingRatio(), m.dampingRatioStd());
            out.append(String.format(Locale.ROOT, "%14s %9s %13s %9s %12.5g %12.5g%n", freq[0], freq[1], zeta[0], zeta[1],
                    m.mode().modalConstant().getReal(), m.mode().modalConstant().getImaginary()));
        }
        if (estimate.modes().isEmpty()) {
            out.append("  no mode found in the band\n");
        }
        estimate.quality().ifPresent(q -> out.append(String.format(Locale.ROOT,
                "Fit: normalised residual %s, correlation %s%n", f.number(q.normalisedResidual()), f.number(q.correlation()))));
        estimate.warnings().forEach(w -> out.append("note: ").append(f.inStyle(w)).append('\n'));
        return out.toString();
    }

    /** A value and its standard error as two cells, rounded together (GUM 7.2.6). */
    private static String[] cells(QuantityFormat f, double value, double u) {
        if (!Double.isFinite(value) || !(u > 0) || Double.isInfinite(u)) {
            return new String[] {f.number(value), Double.isNaN(u) ? QuantityFormat.NOT_EVALUATED : f.number(u)};
        }
        Rounded r = f.round(value, u);
        return new String[] {f.valueCell(r), f.uncertaintyCell(r)};
    }
}
