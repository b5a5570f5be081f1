package dev.proofrun.bench;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;

/**
 * The speed goal of {@code proofrun estimate}: 1,000,000 readings in under 2 s of wall time including JVM
 * start, with {@code -Xmx512m}. A process-level harness (JMH cannot see JVM start): it writes a seeded
 * file of readings (N(10, 0.01), seed 20261201, not committed) into a temporary directory, then runs the
 * shaded jar several times per configuration under {@code /usr/bin/time} and prints wall time and peak
 * resident memory of each run.
 *
 * <p>Run after {@code mvn -o -B -q package -DskipTests}:
 * {@code java src/bench/java/dev/proofrun/bench/EstimateJarBench.java [readings] [runs]}
 * (single-file source launch; needs no classpath).
 */
public final class EstimateJarBench {

    private EstimateJarBench() {
    }

    public static void main(String[] args) throws IOException, InterruptedException {
        int readings = args.length > 0 ? Integer.parseInt(args[0]) : 1_000_000;
        int runs = args.length > 1 ? Integer.parseInt(args[1]) : 3;
        Path jar = Path.of("target/proofrun.jar");
        if (!Files.isRegularFile(jar)) {
            throw new IllegalStateException("build the jar first: mvn -o -B -q package -DskipTests");
        }
        Path dir = Files.createTempDirectory("estimate-bench");
        Path file = dir.resolve("readings.csv");
        Random random = new Random(20261201L);
        try (BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write("value\n");
            for (int i = 0; i < readings; i++) {
                w.write(String.format(Locale.ROOT, "%.5f%n", 10 + 0.01 * random.nextGaussian()));
            }
        }
        System.out.printf(Locale.ROOT, "file: %d readings, %.1f MB%n", readings, Files.size(file) / 1e6);
        String[][] configs = {
            {"subgroups of 5, rbar, exact", "--subgroup-size", "5"},
            {"individuals, mr, exact"},
            {"subgroups of 5, json", "--subgroup-size", "5", "--json"},
        };
        for (String[] config : configs) {
            for (int r = 0; r < runs; r++) {
                List<String> cmd = new ArrayList<>(List.of("/usr/bin/time", "-f", "%e %M", "java", "-Xmx512m", "-jar",
                        jar.toString(), "estimate", file.toString(), "--lsl", "9.95", "--usl", "10.05"));
                for (int i = 1; i < config.length; i++) {
                    cmd.add(config[i]);
                }
                Path err = dir.resolve("err.txt");
                Process p = new ProcessBuilder(cmd).redirectOutput(ProcessBuilder.Redirect.DISCARD)
                        .redirectError(err.toFile()).start();
                int code = p.waitFor();
                List<String> lines = Files.readAllLines(err);
                String[] last = lines.get(lines.size() - 1).trim().split(" ");
                System.out.printf(Locale.ROOT, "%-30s run %d: exit %d, wall %s s, peak RSS %.0f MB%n", config[0], r + 1,
                        code, last[0], Double.parseDouble(last[1]) / 1024);
            }
        }
        Files.deleteIfExists(dir.resolve("err.txt"));
        Files.delete(file);
        Files.delete(dir);
    }
}
