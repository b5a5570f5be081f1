/**
 * Reading a readings file for {@code estimate} and the wizard's pilot: {@code ReadingsCsv.read(path,
 * subgroupSize)} → {@code Readings}, streamed by the one CSV reader ({@code text.CsvReader}), in one of the
 * {@code SubgroupLayout}s ({@code value}, {@code subgroup,value} or {@code x1..xn}). Rows are numbered as a
 * spreadsheet shows them. Numbers follow the dialect's one rule ({@code text.CsvDialect#number}); a row wider
 * than the header (a decimal comma) is flagged with {@code ReadingsMessage}.
 */
package dev.proofrun.readings;
