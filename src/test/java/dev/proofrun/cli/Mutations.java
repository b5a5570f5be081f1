package dev.proofrun.cli;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The ways a file is spoiled on its way back, for the hostile-input fuzz test: each takes the text (or bytes)
 * and a random source and returns the spoiled version. Text mutations work on CSV and on the plan's JSON alike;
 * {@link #bytes} works on any file. The names say what a user (or a transfer) did.
 */
final class Mutations {

    private Mutations() {
    }

    /** Numbers a cell or a plan value may be replaced by: extreme, non-finite, overflowing, tiny, oddly written. */
    static final List<String> EXTREMES = List.of("1e300", "-1e300", "1.7976931348623157e308", "1e309", "-1e309", "NaN",
            "Infinity", "-Infinity", "4.9e-324", "-0", "0", "99999999999999999999", "1e-320", "0x1p3", "1,5", "22,001",
            "\u221E", "", " ", "22.001.5", "1e", "-");

    /** Text that a spreadsheet might evaluate, or that looks like it. */
    static final List<String> FORMULAS = List.of("=1+2", "+22.001", "-22.001", "@SUM(A1:A3)", "'=cmd|' /C calc'!A0",
            "=HYPERLINK(\"x\")", "'+1", "\t22.001", "\r22.001");

    static final int KINDS = 14;

    /** One text mutation of kind {@code kind} (0..{@link #KINDS}-1). */
    static String text(String text, int kind, Random rnd) {
        switch (kind) {
            case 0:
                return truncate(text, rnd);
            case 1:
                return lines(text, rnd, false);
            case 2:
                return lines(text, rnd, true);
            case 3:
                return column(text, rnd, false);
            case 4:
                return column(text, rnd, true);
            case 5:
                return retypeHeader(text, rnd);
            case 6:
                return replaceNumber(text, rnd, EXTREMES.get(rnd.nextInt(EXTREMES.size())));
            case 7:
                return replaceCell(text, rnd, "y".repeat(1 + rnd.nextInt(12_000)));
            case 8:
                return replaceCell(text, rnd, rnd.nextBoolean() ? "\"22.001\n1\"" : "22.001\r1");
            case 9:
                return rnd.nextBoolean() ? "\uFEFF" + text : "\uFEFF\uFEFF" + text.replaceFirst("\n", "\n\uFEFF");
            case 10:
                return text.replace(",", rnd.nextBoolean() ? ";" : "\t");
            case 11:
                return replaceCell(text, rnd, FORMULAS.get(rnd.nextInt(FORMULAS.size())));
            case 12:
                return duplicateKey(text, rnd);
            default:
                return retypeValue(text, rnd);
        }
    }

    /** Byte flips (1 to 8) at random places. */
    static byte[] bytes(byte[] content, Random rnd) {
        byte[] b = content.clone();
        int flips = 1 + rnd.nextInt(8);
        for (int i = 0; i < flips && b.length > 0; i++) {
            b[rnd.nextInt(b.length)] ^= (byte) (1 << rnd.nextInt(8));
        }
        return b;
    }

    private static String truncate(String text, Random rnd) {
        return text.substring(0, rnd.nextInt(text.length() + 1));
    }

    private static String lines(String text, Random rnd, boolean duplicate) {
        List<String> ls = new ArrayList<>(Arrays.asList(text.split("\n", -1)));
        int i = rnd.nextInt(ls.size());
        if (duplicate) {
            ls.add(i, ls.get(i));
        } else {
            ls.remove(i);
        }
        return String.join("\n", ls);
    }

    /** Deletes or duplicates the same comma-separated cell in every line (a column of a CSV). */
    private static String column(String text, Random rnd, boolean duplicate) {
        String[] ls = text.split("\n", -1);
        int col = rnd.nextInt(14);
        for (int i = 0; i < ls.length; i++) {
            List<String> cells = new ArrayList<>(Arrays.asList(ls[i].split(",", -1)));
            if (col < cells.size()) {
                if (duplicate) {
                    cells.add(col, cells.get(col));
                } else {
                    cells.remove(col);
                }
            }
            ls[i] = String.join(",", cells);
        }
        return String.join("\n", ls);
    }

    private static String retypeHeader(String text, Random rnd) {
        int end = text.indexOf('\n');
        if (end < 0) {
            return text;
        }
        String[] cells = text.substring(0, end).split(",", -1);
        int i = rnd.nextInt(cells.length);
        cells[i] = List.of("X1", "Slot ", "value", "x0", "x99999999999", "characteristic", "plan", "", "x5", "taken",
                "remark\u0000").get(rnd.nextInt(11));
        return String.join(",", cells) + text.substring(end);
    }

    private static final Pattern NUMBER = Pattern.compile("(?<![A-Za-z0-9_.@-])-?[0-9]+(\\.[0-9]+)?(?![0-9A-Za-z:-])");

    private static String replaceNumber(String text, Random rnd, String by) {
        Matcher m = NUMBER.matcher(text);
        List<int[]> spans = new ArrayList<>();
        while (m.find()) {
            spans.add(new int[] {m.start(), m.end()});
        }
        if (spans.isEmpty()) {
            return text;
        }
        int[] s = spans.get(rnd.nextInt(spans.size()));
        return text.substring(0, s[0]) + by + text.substring(s[1]);
    }

    /** Replaces one comma-separated cell (or, in JSON, one number) with {@code by}. */
    private static String replaceCell(String text, Random rnd, String by) {
        String[] ls = text.split("\n", -1);
        int i = rnd.nextInt(ls.length);
        String[] cells = ls[i].split(",", -1);
        cells[rnd.nextInt(cells.length)] = by;
        ls[i] = String.join(",", cells);
        return String.join("\n", ls);
    }

    private static final Pattern KEY_LINE = Pattern.compile("(?m)^\\s*\"[A-Za-z]+\": [^\\[{\\n]+,$");

    /** In JSON: a {@code "key": value,} line said twice, the second time with another value or the same. */
    private static String duplicateKey(String text, Random rnd) {
        int[] s = keyLine(text, rnd);
        if (s == null) {
            return text;
        }
        String line = text.substring(s[0], s[1]);
        String again = rnd.nextBoolean() ? line : line.replaceFirst(": .*,$", ": \"DUP\",");
        return text.substring(0, s[1]) + "\n" + again + text.substring(s[1]);
    }

    /** In JSON: a value of another type (a number as text, text as a number, a list, null). */
    private static String retypeValue(String text, Random rnd) {
        int[] s = keyLine(text, rnd);
        if (s == null) {
            return text;
        }
        String by = List.of("\"5\"", "5", "null", "[]", "{}", "true", "-1", "1e309", "\"\"").get(rnd.nextInt(9));
        String line = text.substring(s[0], s[1]).replaceFirst(": .*,$", ": " + by + ",");
        return text.substring(0, s[0]) + line + text.substring(s[1]);
    }

    /** The start and end of one {@code "key": value,} line of the JSON text, chosen at random; null when there is none. */
    private static int[] keyLine(String text, Random rnd) {
        Matcher m = KEY_LINE.matcher(text);
        List<int[]> spans = new ArrayList<>();
        while (m.find()) {
            spans.add(new int[] {m.start(), m.end()});
        }
        return spans.isEmpty() ? null : spans.get(rnd.nextInt(spans.size()));
    }
}
