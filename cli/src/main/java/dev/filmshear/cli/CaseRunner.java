package dev.filmshear.cli;

import dev.filmshear.cli.input.CaseFile;
import dev.filmshear.cli.output.AnalyticComparison;
import dev.filmshear.cli.output.Caution;
import dev.filmshear.cli.output.ResultWriter;
import dev.filmshear.cli.report.CaseText;
import dev.filmshear.solver.base.NumericalFailureException;
import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.FilmSolver;
import dev.filmshear.solver.model.FilmSummary;
import dev.filmshear.solver.model.SimulationFailure;
import dev.filmshear.solver.model.Warning;

import java.io.PrintWriter;
import java.nio.file.Path;

/**
 * Solves one case file and writes its result folder; shared by {@code run} and {@code demo}. A run that
 * fails in the solver still writes what it computed, then reports the failure in the one-line form.
 */
final class CaseRunner {
    private CaseRunner() {
    }

    static int run(CaseFile caseFile, Path out, PrintWriter console) {
        FilmResult result;
        CaseText caseText = caseText(caseFile);
        try {
            result = FilmSolver.solve(caseFile.filmCase());
        } catch (SimulationFailure failure) {
            FilmResult partial = failure.partialResult();
            ResultWriter.write(out, partial, info(caseFile, partial, failure.getMessage()), caseText);
            throw new CommandFailure(ExitCode.FAILED, failureLine(caseFile, failure.getMessage()
                    + "; partial results kept in " + out), failure);
        } catch (NumericalFailureException failure) {
            throw new CommandFailure(ExitCode.FAILED, failureLine(caseFile, failure.getMessage()), failure);
        }
        ResultWriter.write(out, result, info(caseFile, result, null), caseText);
        report(console, caseFile, result, out);
        return ExitCode.DONE.code();
    }

    /** The case as {@code check} resolves it and as written, for the report. */
    static CaseText caseText(CaseFile caseFile) {
        java.io.StringWriter resolved = new java.io.StringWriter();
        CheckCommand.describe(caseFile, new PrintWriter(resolved));
        return new CaseText(resolved.toString(), caseFile.document().text());
    }

    private static ResultWriter.RunInfo info(CaseFile caseFile, FilmResult result, String failure) {
        AnalyticComparison analytic = Analytic.compare(result);
        return new ResultWriter.RunInfo(caseFile.title(), caseFile.fileName(), analytic, failure, caseFile.plots());
    }

    /** The contract's one-line form for a solver failure, pointing at the case's [time] end. */
    static String failureLine(CaseFile caseFile, String message) {
        String key = caseFile.document().has("time.end") ? "time.end" : "time";
        int line = caseFile.document().has(key) ? caseFile.document().line(key) : 0;
        return "error: " + caseFile.fileName() + ":" + line + ": " + key + ": "
                + FilmshearCommand.oneLine(message);
    }

    private static void report(PrintWriter console, CaseFile caseFile, FilmResult result, Path out) {
        FilmSummary s = result.summary();
        console.printf("%s%n", caseFile.title().isEmpty() ? caseFile.fileName() : caseFile.title());
        if (Double.isFinite(s.endTime())) {
            console.printf("  solved to t = %s in %d steps (%d rejected)%s%n", Format.time(s.endTime()), s.steps(),
                    s.rejectedSteps(), s.steady() ? ", film settled" : "");
        } else {
            console.printf("  steady solution (%d continuation steps)%n", s.steps());
        }
        console.printf("  wall shear stress: lower %s Pa, upper %s Pa%n", Format.number(s.wallShearStressLower()),
                Format.number(s.wallShearStressUpper()));
        if (result.filmCase().physics().isThermal()) {
            console.printf("  temperature: highest %s K, mean %s K; dissipation %s W/m^2%n",
                    Format.number(s.maxTemperature()), Format.number(s.meanTemperature()),
                    Format.number(s.dissipation()));
        }
        if (result.filmCase().isJournal()) {
            console.printf("  friction torque %s N*m (Petroff at the mean film viscosity %s N*m), power %s W%n",
                    Format.number(s.frictionTorque()), Format.number(s.petroffTorque()),
                    Format.number(s.frictionPower()));
        }
        if (!Double.isNaN(s.speedRiseTime())) {
            console.printf("  driven wall reached 99 %% of its final speed at t = %s%n", Format.time(s.speedRiseTime()));
        }
        if (!Double.isNaN(s.coastDownTime())) {
            console.printf("  driven wall coasted down to its reporting fraction of the initial speed at t = %s%n",
                    Format.time(s.coastDownTime()));
        }
        console.printf("  Reynolds number %s%n", Format.number(result.numbers().reynoldsNumber()));
        for (Warning w : result.warnings()) {
            console.printf("  warning: %s%n", w.message());
        }
        console.printf("  results in %s%n", out);
        console.printf("%s%n", Caution.TEXT);
    }
}
