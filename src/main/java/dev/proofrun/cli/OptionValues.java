package dev.proofrun.cli;

import dev.proofrun.schedule.Spacing;
import dev.proofrun.stats.BoundMethod;
import dev.proofrun.stats.Confidence;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SigmaMethod;
import dev.proofrun.stats.SpecLimits;
import dev.proofrun.text.UserException;
import java.time.DateTimeException;
import java.util.Locale;
import java.util.Optional;
import java.util.function.Function;
import java.util.function.Supplier;

/**
 * The command line's one reader of each convention: the required index ({@code --index}), the within-sigma
 * estimator ({@code --sigma}), the bound method ({@code --bound}), the slot spacing ({@code --spacing}), the
 * specification sides ({@code --spec}), the limits ({@code --lsl}, {@code --usl}) and the confidence of the
 * lower bounds ({@code --confidence}). Every command reads
 * them here, so a bad value gets the same one line from each: the option, then what is wrong with the value
 * ({@link OptionMessage#BAD_VALUE}, e.g. {@code --sigma: unknown sigma method 'rbr' (rbar, sbar, pooled or mr)}).
 */
final class OptionValues {

    private OptionValues() {
    }

    /** @throws UserException naming {@code --index} for an unknown index */
    static IndexKind index(String token) {
        return parse("--index", token, IndexKind::fromToken);
    }

    /** @return empty when not given (the estimator then follows the subgroup size) */
    static Optional<SigmaMethod> sigma(String token) {
        return token == null ? Optional.empty() : Optional.of(parse("--sigma", token, SigmaMethod::fromToken));
    }

    /** @throws UserException naming {@code --bound} for an unknown bound method */
    static BoundMethod bound(String token) {
        return parse("--bound", token, BoundMethod::fromToken);
    }

    /** @throws UserException naming {@code --shape} for an unknown shape, with the names */
    static dev.proofrun.stats.ShapeFamily shape(String token) {
        return parse("--shape", token, dev.proofrun.stats.ShapeFamily::fromToken);
    }

    /** @throws UserException naming {@code --spacing} for an unknown spacing */
    static Spacing spacing(String token) {
        return parse("--spacing", token, Spacing::fromToken);
    }

    /**
     * The specification sides: {@code two-sided}, {@code upper} or {@code lower} as given, else as the
     * limits given imply, else two-sided.
     *
     * @param token {@code --spec}, or null
     * @param lsl   {@code --lsl}, or null
     * @param usl   {@code --usl}, or null
     * @throws UserException for an unknown value, unusable limits ({@link #limits}), or sides the limits
     *                       contradict
     */
    static SpecLimits.Sides sides(String token, Double lsl, Double usl) {
        SpecLimits.Sides fromLimits = lsl == null && usl == null ? null : limits(lsl, usl).sides();
        if (token == null) {
            return fromLimits == null ? SpecLimits.Sides.TWO_SIDED : fromLimits;
        }
        SpecLimits.Sides given = switch (token.trim().toLowerCase(Locale.ROOT)) {
            case "two-sided" -> SpecLimits.Sides.TWO_SIDED;
            case "upper" -> SpecLimits.Sides.UPPER_ONLY;
            case "lower" -> SpecLimits.Sides.LOWER_ONLY;
            default -> throw new UserException(OptionMessage.BAD_VALUE, "--spec",
                    OptionMessage.UNKNOWN_SIDES.format(token));
        };
        if (fromLimits != null && fromLimits != given) {
            throw new UserException(OptionMessage.SIDES_DO_NOT_MATCH);
        }
        return given;
    }

    /**
     * @param lsl {@code --lsl}, or null
     * @param usl {@code --usl}, or null
     * @throws UserException if neither is given, one is not finite, or LSL ≥ USL
     */
    static SpecLimits limits(Double lsl, Double usl) {
        if (lsl == null && usl == null) {
            throw new UserException(OptionMessage.NO_LIMIT);
        }
        if (lsl != null && !Double.isFinite(lsl)) {
            throw new UserException(OptionMessage.LIMIT_NOT_FINITE, "--lsl", lsl);
        }
        if (usl != null && !Double.isFinite(usl)) {
            throw new UserException(OptionMessage.LIMIT_NOT_FINITE, "--usl", usl);
        }
        if (lsl != null && usl != null && lsl >= usl) {
            throw new UserException(OptionMessage.LIMITS_REVERSED, lsl, usl);
        }
        return SpecLimits.of(lsl, usl);
    }

    /**
     * @param confidence {@code --confidence}, 1 − α
     * @return it, when strictly between {@link Confidence#MIN} and
     *         {@link Confidence#MAX_STATED} (the range a person may state, {@link Confidence#isStatable})
     * @throws UserException otherwise
     */
    static double confidence(double confidence) {
        if (!Confidence.isStatable(confidence)) {
            throw new UserException(OptionMessage.CONFIDENCE_OUT_OF_RANGE, Confidence.MIN, Confidence.MAX_STATED, confidence);
        }
        return confidence;
    }

    /**
     * Runs a parse or a model constructor for an option; its refusal ({@link IllegalArgumentException},
     * {@link DateTimeException}) becomes the one line {@code OPTION: what is wrong}.
     */
    static <T> T option(String name, Supplier<T> make) {
        try {
            return make.get();
        } catch (IllegalArgumentException | DateTimeException e) {
            throw new UserException(OptionMessage.BAD_VALUE, name, e.getMessage());
        }
    }

    private static <T> T parse(String option, String token, Function<String, T> fromToken) {
        return option(option, () -> fromToken.apply(token));
    }
}
