package dev.proofrun.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import dev.proofrun.capability.CapabilityAnalysis;
import dev.proofrun.capability.CapabilityJson;
import dev.proofrun.capability.CapabilityResult;
import dev.proofrun.readings.Readings;
import dev.proofrun.readings.ReadingsCsv;
import dev.proofrun.stats.BoundMethod;
import dev.proofrun.stats.SigmaMethod;
import dev.proofrun.stats.SpecLimits;
import dev.proofrun.text.Location;
import dev.proofrun.text.UserException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.OptionalInt;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code proofrun estimate}: the capability of readings already at hand (a pilot run, old data), with
 * lower confidence bounds, expected and observed nonconforming parts and a normality test.
 */
@Command(name = "estimate", mixinStandardHelpOptions = true,
        description = "Capability of readings you already have: indices, lower confidence bounds, ppm, normality.%n"
                + "FILE.csv has a 'value' column (optionally 'subgroup'), or one subgroup per row in x1..xn.")
public final class EstimateCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE.csv", description = "The readings.")
    Path file;

    @Mixin
    SpecLimitOptions limits;

    @Mixin
    NominalOption target;

    @Option(names = "--subgroup-size", paramLabel = "N",
            description = "Group consecutive readings of a 'value' column into subgroups of N (default: individuals).")
    Integer subgroupSize;

    @Mixin
    EstimatorOptions estimator;

    @Mixin
    ConfidenceOption level;

    @Mixin
    JsonOption output;

    @Override
    public Integer call() throws JsonProcessingException {
        SpecLimits specLimits = limits.limits();
        SigmaMethod method = OptionValues.sigma(estimator.sigma).orElse(null);
        BoundMethod boundMethod = OptionValues.bound(estimator.bound);
        double confidence = level.confidence;
        OptionValues.confidence(confidence);
        Readings readings = ReadingsCsv.read(file,
                subgroupSize == null ? OptionalInt.empty() : OptionalInt.of(subgroupSize));
        CapabilityResult result;
        try {
            result = CapabilityAnalysis.of(readings.subgroups(), specLimits, target.nominal, method, confidence, boundMethod);
        } catch (UserException e) {
            throw e.placedIn(Location.file(file.toString()));
        }
        String text = output.json
                ? new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT).writeValueAsString(CapabilityJson.of(result))
                : EstimateText.of(file.toString(), result, result.normality().isPresent()
                        && result.normality().get().pValue() < 0.05 ? RoundingCheck.explain(readings.subgroups())
                        : java.util.Optional.empty());
        PrintWriter out = spec.commandLine().getOut();
        out.println(text);
        out.flush();
        return 0;
    }
}
