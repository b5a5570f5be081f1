/**
 * What every layer shares about the words people read and the input they give.
 *
 * <ul>
 * <li>{@code MessageKey}: a user-visible message is an enum constant implementing it (stable key, English
 * template inline, formatted with {@code Locale.ROOT}); one enum per package, so the command line and the
 * wizard say the same words. {@code MessageKeysTest} finds every enum and fails on a template that does not
 * format.</li>
 * <li>{@code UserException} with a {@code Location} (file, row, column): bad input. The command line prints its
 * message on one line and exits 2, never with a stack trace.</li>
 * <li>{@code FormulaGuard}: the one rule for spreadsheet formula guarding. A prefilled cell that starts with
 * {@code =}, {@code +}, {@code -}, {@code @}, tab or CR gets a leading {@code '}; {@code restore} takes it off
 * again. The sheet writer and the grade reader both use it, so the two cannot drift.</li>
 * <li>{@code AtomicFile}: the one way a file is written — temporary file beside it, forced, moved in one step; new
 * files as the umask says, replaced ones keep their permissions.</li>
 * <li>{@code CsvReader} (over {@code CsvLines}) in the dialect of {@code CsvDialect}: the one CSV reader — returned
 * files, files of readings, characteristic lists; {@code Decimals} (and {@code DecimalMark} for fields people
 * type): the one number rule.</li>
 * <li>{@code Token} and {@code Tokens}: the one word rule for enums named in files, options and JSON. The word is the
 * constant's name in lower case with {@code _} as {@code -} ({@code NOT_VALID} is {@code not-valid}) unless the enum
 * overrides {@code token()} ({@code SigmaMethod.MOVING_RANGE} is {@code mr}); {@code Tokens.parse} reads it back in
 * any case, space around it ignored, and refuses an unknown word with one message that lists the known ones.</li>
 * </ul>
 */
package dev.proofrun.text;
