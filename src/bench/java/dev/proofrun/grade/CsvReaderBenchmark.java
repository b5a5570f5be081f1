package dev.proofrun.grade;

import dev.proofrun.text.CsvDialect;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The hand-made CSV reader ({@link CsvTable} over {@link CsvLines}) against commons-csv on a returned file of
 * 1,000,000 readings: the fill-in form of {@link GradeHarness#plan()} (one characteristic, 200,000 slots of 5),
 * written in the set-up by {@link SimulatedReturn#writeCsv} with seed 1 (a stable process, mean 10.0, σ 0.015;
 * about 25 MB). Both readers hand the same trimmed cells to the same handler:
 * <ul>
 * <li>{@code *Cells}: a handler that only reads every reading cell by the dialect's number rule — the reader's
 *     own cost;</li>
 * <li>{@code *Graded}: the grader's own handler, {@link ReturnedData}, as {@code proofrun grade} reads a file.</li>
 * </ul>
 * The commons-csv side is configured as the product would use it (the dialect's separator from the header
 * line, trimmed cells, a {@code BufferedReader} over UTF-8, row numbers from the parser). Run:
 * {@code mvn -B -Pbench test-compile exec:exec -Dbench=CsvReaderBenchmark}. Figures and the decision:
 * {@code docs/decisions/one-csv-reader.md}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgs = {"-Xmx1g"})
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
public class CsvReaderBenchmark {

    private GradingPlan plan;
    private Path file;

    @Setup(Level.Trial)
    public void write() throws IOException {
        plan = GradeHarness.plan();
        file = Files.createTempFile("proofrun-bench-", ".csv");
        SimulatedReturn.writeCsv(plan, Map.of("D1", SimulatedReturn.Process.stable(10.0, 0.015)), 1L, file);
    }

    @TearDown(Level.Trial)
    public void delete() throws IOException {
        Files.deleteIfExists(file);
    }

    @Benchmark
    public double handMadeCells() {
        NumberSum sum = new NumberSum();
        CsvTable.read(file, "bench.csv", sum);
        return sum.total;
    }

    @Benchmark
    public double commonsCsvCells() {
        NumberSum sum = new NumberSum();
        readWithCommonsCsv(file, sum);
        return sum.total;
    }

    @Benchmark
    public long handMadeGraded() {
        ReturnedData data = new ReturnedData(plan, "bench.csv");
        CsvTable.read(file, "bench.csv", data);
        return data.rows();
    }

    @Benchmark
    public long commonsCsvGraded() {
        ReturnedData data = new ReturnedData(plan, "bench.csv");
        readWithCommonsCsv(file, data);
        return data.rows();
    }

    /** What {@link CsvTable#read} does, with commons-csv splitting the lines. */
    static void readWithCommonsCsv(Path path, RowHandler handler) {
        try (BufferedReader in = Files.newBufferedReader(path, StandardCharsets.UTF_8)) {
            in.mark(1 << 16);
            String first = in.readLine();
            in.reset();
            char separator = CsvDialect.separator(first == null ? "" : first);
            handler.separator(separator);
            CSVFormat format = CSVFormat.DEFAULT.builder().setDelimiter(separator).setTrim(true).setIgnoreEmptyLines(true).get();
            try (CSVParser parser = CSVParser.builder().setReader(in).setFormat(format).get()) {
                String[] cells = new String[32];
                boolean header = true;
                for (CSVRecord r : parser) {
                    int n = r.size();
                    if (n > cells.length) {
                        cells = new String[n];
                    }
                    for (int i = 0; i < n; i++) {
                        cells[i] = r.get(i);
                    }
                    if (header) {
                        String[] h = new String[n];
                        System.arraycopy(cells, 0, h, 0, n);
                        if (!h[0].isEmpty() && h[0].charAt(0) == '\uFEFF') {
                            h[0] = h[0].substring(1);
                        }
                        handler.header(parser.getCurrentLineNumber(), h);
                        header = false;
                    } else {
                        handler.row(parser.getCurrentLineNumber(), cells, n);
                    }
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Reads every cell of the reading columns ({@code x1..}) as a number, and nothing else. */
    static final class NumberSum implements RowHandler {
        private int[] readingColumns;
        double total;

        @Override
        public void header(long row, String[] cells) {
            readingColumns = java.util.stream.IntStream.range(0, cells.length)
                    .filter(i -> cells[i].matches("x[0-9]+")).toArray();
        }

        @Override
        public void row(long row, String[] cells, int count) {
            for (int c : readingColumns) {
                if (c < count && !cells[c].isEmpty()) {
                    total += CsvDialect.number(cells[c]);
                }
            }
        }
    }
}
