/**
 * The command line (picocli): {@code ProofrunCommand} with {@code estimate}, {@code size}, {@code plan}
 * ({@code new}, {@code show}, {@code issue}), {@code sheet}, {@code grade} and {@code demo}. Exit 0 when done
 * whatever the verdict, 1 with {@code --require-demonstrated} when something is not demonstrated, 2 for
 * unusable input (one line, nothing on standard output, no file written).
 *
 * <ul>
 * <li>{@code OptionValues} reads every convention option ({@code --index}, {@code --sigma}, {@code --bound},
 * {@code --spacing}, {@code --spec}), the limits and {@code --confidence} in one place, so a bad value is the
 * same line from every command ({@code OptionMessage}). An option that means the same in several commands is
 * declared once, with one help text, as a picocli mixin ({@code StudyGoalOptions}, {@code ConfidenceOption},
 * {@code SpecLimitOptions}, {@code NominalOption}, {@code GaugeOptions}, {@code ShapeOption},
 * {@code EstimatorOptions}, {@code StagesOptions}, {@code JsonOption}, {@code PaperOption}); one that means
 * something else in a command ({@code --subgroup-size}, {@code --characteristics}, {@code --floor}, {@code --out})
 * stays declared there.</li>
 * <li>A run naming one job registers only that job's command (help and refusals are the same as the full
 * command line's, {@code ProofrunCommandTest}).</li>
 * <li>JSON views: {@code SizeJson}, {@code GradeJson}, {@code capability.CapabilityJson} (shared by
 * {@code estimate} and {@code grade}).</li>
 * <li>{@code plan new} writes nothing when anything is refused and refuses an existing {@code --out} unless
 * {@code --force}. Its defaults: this computer's zone, days MON-FRI, shifts 06:00-14:00,14:00-22:00 (named A,
 * B unless {@code name=} is given), no breaks, 60 parts an hour (said on the output), one working day, even
 * spacing, and a new seed, stored, when the spacing is random. Calendars are written
 * {@code early=06:00-14:00} here ({@code PlanSyntax}).</li>
 * </ul>
 */
package dev.proofrun.cli;
