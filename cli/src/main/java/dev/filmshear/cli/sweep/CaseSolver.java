package dev.filmshear.cli.sweep;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.filmshear.cli.input.CaseFile;
import dev.filmshear.cli.input.CaseReader;
import dev.filmshear.cli.input.InputException;
import dev.filmshear.cli.output.ResultWriter;
import dev.filmshear.solver.base.InvalidParameterException;
import dev.filmshear.solver.base.NumericalFailureException;
import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.FilmSolver;
import dev.filmshear.solver.model.SimulationFailure;
import dev.filmshear.solver.model.SolverOptions;

import java.util.ArrayList;
import java.util.List;

/**
 * Solves one combination of a plan and turns it into its line of results.csv. Shared by the worker
 * threads: it holds only immutable state.
 *
 * <p>Each case is read from the base case with the axis values as overrides, solved with
 * {@link SolverOptions#outputTimesOnly()} (no per-step history is kept), and summarized by
 * {@link ResultWriter#summary}; no plots or per-case folders are written. A case that cannot be read
 * (a bad combination) or whose solve fails becomes a {@code failed} row with its message on one line; a
 * solver failure part-way still fills the numeric columns from what it computed. Anything else is a bug,
 * reported in the row as {@code internal error: ...} so that one case never stops the sweep.
 */
final class CaseSolver {
    private static final SolverOptions OPTIONS = SolverOptions.defaults().outputTimesOnly();

    private final SweepPlan plan;
    private final CaseReader reader;

    CaseSolver(SweepPlan plan, CaseReader reader) {
        this.plan = plan;
        this.reader = reader;
    }

    /**
     * One finished case.
     *
     * @param index the case index
     * @param ok true when its status is ok
     * @param line its line of results.csv, with the line break
     */
    record Row(long index, boolean ok, String line) {
    }

    /** Solves case {@code index}; never throws for a problem of the case itself. */
    Row solve(long index) {
        CaseFile caseFile;
        try {
            caseFile = reader.read(plan.caseDocument(index));
        } catch (InputException e) {
            return row(index, null, e.getMessage());
        }
        ResultWriter.RunInfo info = new ResultWriter.RunInfo(caseFile.title(), caseFile.fileName(), null, null, false);
        try {
            FilmResult result = FilmSolver.solve(caseFile.filmCase(), OPTIONS);
            return row(index, ResultWriter.summary(result, info), null);
        } catch (SimulationFailure failure) {
            ResultWriter.RunInfo failed = new ResultWriter.RunInfo(info.title(), info.caseFileName(), null,
                    failure.getMessage(), false);
            return row(index, ResultWriter.summary(failure.partialResult(), failed), failure.getMessage());
        } catch (NumericalFailureException | InvalidParameterException failure) {
            return row(index, null, failure.getMessage());
        } catch (RuntimeException bug) {
            // a bug in filmshear, not in the case: recorded in the row so that the other cases still run
            return row(index, null, "internal error: " + bug + " (rerun this case with filmshear run and report it)");
        }
    }

    private Row row(long index, ObjectNode summary, String failure) {
        int[] digits = plan.digits(index);
        List<String> fields = new ArrayList<>(ResultColumns.SUMMARY_KEYS.size() + digits.length + 5);
        for (int a = 0; a < digits.length; a++) {
            fields.add(plan.axes().get(a).csv(digits[a]));
        }
        fields.add(failure == null ? ResultColumns.OK : ResultColumns.FAILED);
        fields.add(failure == null ? "" : oneLine(failure));
        if (summary == null) {
            for (int k = 0; k < ResultColumns.SUMMARY_KEYS.size() + 2; k++) {
                fields.add("");
            }
        } else {
            for (String key : ResultColumns.SUMMARY_KEYS) {
                fields.add(number(summary.get(key)));
            }
            List<String> codes = new ArrayList<>();
            summary.path("warning_codes").forEach(code -> codes.add(code.asText()));
            fields.add(String.join(";", codes));
            fields.add(summary.path("steady").asText(""));
        }
        fields.add(Long.toString(index));
        StringBuilder line = new StringBuilder(512);
        for (int i = 0; i < fields.size(); i++) {
            if (i > 0) {
                line.append(',');
            }
            line.append(CsvLine.field(fields.get(i)));
        }
        return new Row(index, failure == null, line.append('\n').toString());
    }

    /** A summary value as a field: whole numbers as such, other numbers as the shortest round-trip decimal. */
    static String number(JsonNode value) {
        if (value == null || !value.isNumber()) {
            return "";
        }
        return value.isIntegralNumber() ? value.asText() : Double.toString(value.doubleValue());
    }

    /** A message on one line: line breaks and the spaces around them become "; ". */
    static String oneLine(String message) {
        return message == null ? "" : message.strip().replaceAll("\\s*[\\r\\n\\u2028\\u2029\\u0085]+\\s*", "; ");
    }
}
