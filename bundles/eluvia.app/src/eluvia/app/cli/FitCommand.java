package eluvia.app.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

import eluvia.report.Json;
import eluvia.transport.ColumnFitResult;
import eluvia.transport.ColumnObservation;
import eluvia.transport.ColumnTestFit;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

/**
 * {@code fit <curve.csv>}: column-test calibration. The CSV has two columns, pore volumes and
 * relative concentration C/C0 (a header row is allowed); the fit is by Levenberg-Marquardt with
 * standard errors and 95 % confidence intervals.
 */
@Command(name = "fit", mixinStandardHelpOptions = true, sortOptions = false,
        description = { "Fits transport parameters to a measured column curve (pore volumes, C/C0) by Levenberg-Marquardt.",
                "Prints each parameter with its standard error and 95 % confidence interval, and warns when the data do not determine it." })
final class FitCommand implements Callable<Integer> {

    @ParentCommand
    EluviaCommand parent;

    @Parameters(index = "0", paramLabel = "CURVE", description = "CSV: pore volumes, relative concentration C/C0 (header row optional)")
    Path curveFile;

    @Option(names = "--curve", defaultValue = "elution", paramLabel = "WORD", description = "breakthrough (clean column fed C0) or elution (contaminated column flushed clean); default ${DEFAULT-VALUE}")
    String curve;

    @Option(names = "--model", defaultValue = "equilibrium", paramLabel = "WORD", description = "equilibrium (R, P; finite column), semi-infinite (R, P) or two-region (R, P, beta, omega); default ${DEFAULT-VALUE}")
    String model;

    @Option(names = "--json", description = "print one JSON object instead of text")
    boolean json;

    @Override
    public Integer call() {
        ColumnTestFit.Curve c = switch (curve.toLowerCase(Locale.ROOT)) {
        case "breakthrough" -> ColumnTestFit.Curve.BREAKTHROUGH;
        case "elution" -> ColumnTestFit.Curve.ELUTION;
        default -> throw new OptionCheck("--curve", curve, "breakthrough or elution");
        };
        ColumnTestFit.Model m = switch (model.toLowerCase(Locale.ROOT)) {
        case "equilibrium" -> ColumnTestFit.Model.FINITE_EQUILIBRIUM;
        case "semi-infinite" -> ColumnTestFit.Model.SEMI_INFINITE_EQUILIBRIUM;
        case "two-region" -> ColumnTestFit.Model.FINITE_TWO_REGION;
        default -> throw new OptionCheck("--model", model, "equilibrium, semi-infinite or two-region");
        };
        List<ColumnObservation> data = read(parent.environment.workingDirectory().resolve(curveFile));
        if (data.size() <= m.parameterNames().size()) {
            throw new OptionCheck("CURVE", data.size() + " points", "more points than parameters (" + m.parameterNames().size() + ")");
        }
        ColumnFitResult r = ColumnTestFit.fit(data, c, m);
        PrintWriter out = parent.spec.commandLine().getOut();
        if (json) {
            Json j = new Json().beginObject().field("curve", curve.toLowerCase(Locale.ROOT)).field("model", model.toLowerCase(Locale.ROOT))
                    .field("points", data.size()).field("degreesOfFreedom", r.degreesOfFreedom())
                    .field("rootMeanSquareResidual", r.rootMeanSquareResidual());
            j.name("parameters").beginArray();
            for (ColumnFitResult.FittedParameter p : r.parameters()) {
                j.beginObject().field("name", p.name()).field("value", p.value()).field("standardError", p.standardError())
                        .field("lower95", p.lower95()).field("upper95", p.upper95()).field("identifiable", p.identifiable())
                        .endObject();
            }
            j.endArray().name("warnings").beginArray();
            r.warnings().forEach(j::value);
            j.endArray().name("residuals").beginArray();
            r.residuals().forEach(j::value);
            out.print(j.endArray().endObject().toString());
        } else {
            out.printf(Locale.ROOT, "%s curve, %s model, %d points, RMS residual %.3g%n", curve, model, data.size(),
                    r.rootMeanSquareResidual());
            for (ColumnFitResult.FittedParameter p : r.parameters()) {
                out.printf(Locale.ROOT, "  %-6s %12.5g   standard error %10.3g   95 %% interval [%.5g, %.5g]%s%n", p.name(),
                        p.value(), p.standardError(), p.lower95(), p.upper95(), p.identifiable() ? "" : "   NOT IDENTIFIABLE");
            }
            r.warnings().forEach(w -> out.println("warning: " + w));
        }
        return EluviaCommand.OK;
    }

    static List<ColumnObservation> read(Path file) {
        if (!Files.isRegularFile(file)) {
            throw new OptionCheck("CURVE", file, "an existing CSV file");
        }
        List<ColumnObservation> data = new ArrayList<>();
        CSVFormat format = CSVFormat.DEFAULT.builder().setTrim(true).setIgnoreEmptyLines(true).setCommentMarker('#').get();
        try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8); CSVParser p = CSVParser.parse(in, format)) {
            for (CSVRecord r : p) {
                String where = file.getFileName() + " line " + p.getCurrentLineNumber();
                if (r.size() < 2) {
                    throw new OptionCheck("CURVE", where + " has " + r.size() + " column(s)", "two columns: pore volumes, C/C0");
                }
                double pv;
                double c;
                try {
                    pv = Double.parseDouble(r.get(0));
                    c = Double.parseDouble(r.get(1));
                } catch (NumberFormatException e) {
                    if (data.isEmpty() && r.getRecordNumber() == 1) {
                        continue; // a header row
                    }
                    throw new OptionCheck("CURVE", where + ": '" + r.get(0) + "', '" + r.get(1) + "'", "two numbers");
                }
                if (!(pv >= 0) || !Double.isFinite(c)) {
                    throw new OptionCheck("CURVE", where + ": pore volumes " + pv + ", C/C0 " + c, "pore volumes 0 or more and a finite C/C0");
                }
                data.add(new ColumnObservation(pv, c));
            }
        } catch (IOException | java.io.UncheckedIOException e) {
            throw new OptionCheck("CURVE", file, "a readable CSV file (" + e.getMessage() + ")");
        }
        return data;
    }
}
