package dev.proofrun.grade;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.IntStream;

/**
 * The folded-normal rows of docs/decisions/declared-shape-grading.md: for each case of
 * {@link FoldedNormalCoverageTest#grid()} the fraction of simulated studies graded demonstrated (and not valid)
 * at the true percentile index (c₀ = 1.33 by default, or the index given), graded by {@link Grader#grade};
 * case i (in grid order) has studies with seeds 60,000 + 1,000·i + s, as the {@code long} test.
 *
 * <pre>mvn -B -q -Pbench test-compile
 * java -cp "target/test-classes:target/classes:$(mvn -q -Pbench dependency:build-classpath -Dmdep.outputFile=/dev/stdout)" \
 *     dev.proofrun.grade.FoldedNormalTable 300 [true index]</pre>
 */
public final class FoldedNormalTable {

    private FoldedNormalTable() {
    }

    public static void main(String[] args) throws Exception {
        int studies = args.length > 0 ? Integer.parseInt(args[0]) : 300;
        double index = args.length > 1 ? Double.parseDouble(args[1]) : FoldedNormalCoverageTest.C0;
        List<ShapeStudies.Case> grid = FoldedNormalCoverageTest.grid();
        String[] rows = IntStream.range(0, grid.size()).parallel().mapToObj(i -> {
            ShapeStudies.Case g = grid.get(i);
            ShapeStudies.Case c = new ShapeStudies.Case(g.family(), g.parameter(), index, g.n(), g.k(), false);
            try {
                Path dir = Files.createTempDirectory("folded-coverage");
                Map<Verdict, Integer> v = ShapeStudies.run(c, FoldedNormalCoverageTest.C0, studies, 60_000L + 1_000L * i, dir);
                return String.format(Locale.ROOT, "%-48s %5d  demonstrated %.4f  not valid %.4f", c.label(), studies,
                        v.getOrDefault(Verdict.DEMONSTRATED, 0) / (double) studies,
                        v.getOrDefault(Verdict.NOT_VALID, 0) / (double) studies);
            } catch (java.io.IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        }).toArray(String[]::new);
        for (String r : rows) {
            System.out.println(r);
        }
    }
}
