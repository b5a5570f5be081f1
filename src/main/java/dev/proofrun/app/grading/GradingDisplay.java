package dev.proofrun.app.grading;

import dev.proofrun.app.chart.CurvePlot;
import java.util.List;
import java.util.Objects;

/**
 * What the Grading step shows, as plain values and finished words: {@link GradingViewModel} makes them from the
 * grade (the words from message keys, the same the command line and the report use) and the view only binds and
 * draws them. No core type appears here, so a view never reaches into the grade.
 */
public final class GradingDisplay {

    private GradingDisplay() {
    }

    /**
     * How a verdict is marked on screen beside its words. The words carry the verdict; the tone is only the
     * theme's colour class, so that any verdict the grader knows (a new one included) is shown by its words.
     */
    public enum Tone {
        /** Demonstrated. */
        GOOD("pr-verdict-good"),
        /** Neither shown nor refuted yet (inconclusive, or a verdict that asks for more data). */
        OPEN("pr-verdict-open"),
        /** Not demonstrated or not valid. */
        SHORT("pr-verdict-short");

        private final String styleClass;

        Tone(String styleClass) {
            this.styleClass = styleClass;
        }

        /** The style class in proofrun.css. */
        public String styleClass() {
            return styleClass;
        }
    }

    /** One problem of the returned file: where (row, column; blank for the file as a whole), what kind, what. */
    public record ProblemRow(String row, String column, String kind, String characteristic, String problem) {
    }

    /**
     * One characteristic in the table of grades.
     *
     * @param estimate        "Cpk 1.902", or "—" when no index was computed
     * @param lowerVsRequired "1.663 vs 1.330", or "—"
     */
    public record GradeRow(String id, String name, String verdict, String estimate, String lowerVsRequired) {
    }

    /**
     * One step of the argument as it was judged.
     *
     * @param id    the step's id ("completeness", "stability", "shape", "capability"), for the node's id
     * @param title the heading, e.g. "2  Stability: was the process in control?"
     * @param text  its reasons, one sentence a line
     */
    public record StepEvidence(String id, String title, String text) {
    }

    /** One index with its estimate and lower bound ("—" where there is none). */
    public record IndexRow(String symbol, String estimate, String lower) {
    }

    /**
     * The indices the readings define.
     *
     * @param title     the table's heading
     * @param lowerHead the bound column's heading, e.g. "lower 95 % bound"
     */
    public record IndexTable(String title, String lowerHead, List<IndexRow> rows) {
        public IndexTable {
            rows = List.copyOf(rows);
        }
    }

    /** A chart: its title and its named lines. */
    public record Chart(String title, String xName, String yName, List<CurvePlot.Line> lines) {
        public Chart {
            lines = List.copyOf(lines);
        }

        /** A chart with nothing to draw. */
        static Chart empty(String title, String xName, String yName) {
            return new Chart(title, xName, yName, List.of());
        }
    }

    /**
     * One characteristic's evidence, in the order of the argument.
     *
     * @param heading    "D1 bore diameter: Demonstrated", with how many more subgroups would settle an open one
     * @param tone       the heading's mark
     * @param steps      the steps that were judged, each with its reasons; a step the argument did not reach is
     *                   left out
     * @param notReached "" or one sentence naming the steps left out because an earlier step decided
     * @param summary    what the verdict rests on ("Cpk under the normal model …"), or ""
     * @param indices    every index with its bound, or {@code null} when none could be computed
     * @param location   the location control chart
     * @param spread     the spread control chart
     * @param readings   the readings in time order against the limits
     * @param histogram  the readings' histogram with the limits and the planned shape's fitted curve (no lines
     *                   when there is no shape evidence)
     */
    public record Characteristic(String heading, Tone tone, List<StepEvidence> steps, String notReached, String summary,
            IndexTable indices, Chart location, Chart spread, Chart readings, Chart histogram) {
        public Characteristic {
            Objects.requireNonNull(tone, "tone");
            steps = List.copyOf(steps);
        }
    }
}
