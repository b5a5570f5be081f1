package dev.proofrun.grade;

import dev.proofrun.stats.ShapeFamily;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;

/**
 * The coverage table of docs/decisions/declared-shape-grading.md: for each case of
 * {@link DeclaredShapeCoverageTest#grid()} the fraction of simulated studies graded demonstrated (and not valid)
 * at the true percentile index c₀ = 1.33 and at 1.67, graded by {@link Grader#grade}.
 *
 * <pre>mvn -B -q -Pbench test-compile
 * java -cp "target/test-classes:target/classes:$(mvn -q -Pbench dependency:build-classpath -Dmdep.outputFile=/dev/stdout)" \
 *     dev.proofrun.grade.ShapeCoverageTable 2000</pre>
 */
public final class ShapeCoverageTable {

    private ShapeCoverageTable() {
    }

    public static void main(String[] args) throws Exception {
        int studies = args.length > 0 ? Integer.parseInt(args[0]) : 2000;
        Path dir = Files.createTempDirectory("shape-coverage");
        System.out.printf(Locale.ROOT, "%-36s %8s %14s %14s%n", "case (true index, k x n)", "studies", "demonstrated",
                "not valid");
        for (double index : new double[] {1.33, 1.67}) {
            for (ShapeStudies.Case base : DeclaredShapeCoverageTest.grid()) {
                ShapeStudies.Case c = new ShapeStudies.Case(base.family(), base.parameter(), index, base.n(), base.k(), base.twoSided());
                Map<Verdict, Integer> v = ShapeStudies.run(c, 1.33, studies, 50_000L, dir);
                System.out.printf(Locale.ROOT, "%-36s %8d %14.4f %14.4f%n", c.label(), studies,
                        v.getOrDefault(Verdict.DEMONSTRATED, 0) / (double) studies,
                        v.getOrDefault(Verdict.NOT_VALID, 0) / (double) studies);
            }
        }
        ShapeStudies.Case capable = new ShapeStudies.Case(ShapeFamily.NORMAL, 0, 2.0, 5, 27, true);
        Map<Verdict, Integer> v = ShapeStudies.run(capable, 1.33, studies, 7_000L, dir);
        System.out.printf(Locale.ROOT, "%-36s %8d %s%n", capable.label(), studies, v);
    }
}
