package dev.proofrun.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * Every command's help at the default width of 80 columns: no token cut across two lines ("HH:MM-HH:" then
 * "MM"), no bare "..." standing for what the reader has to guess (picocli's "]..." after a repeatable option
 * in the synopsis is the one allowed).
 */
class HelpTextTest {

    /**
     * A line ending inside a token: a letter or digit, then ':', '-', '/', '=' or '|' (a comma may end a line:
     * picocli drops the space after it, so "a, b" and "a,b" cut there look alike; defaults that are lists
     * stand on a line of their own).
     */
    private static final Pattern CUT_END = Pattern.compile(".*[A-Za-z0-9][:\\-/=|]$");
    private static final Pattern CONTINUES = Pattern.compile("^\\s*[A-Za-z0-9].*");

    private static final List<String[]> COMMANDS = List.of(new String[] {"--help"}, new String[] {"size", "--help"},
            new String[] {"plan", "new", "--help"}, new String[] {"plan", "show", "--help"},
            new String[] {"plan", "issue", "--help"}, new String[] {"sheet", "--help"},
            new String[] {"estimate", "--help"}, new String[] {"grade", "--help"}, new String[] {"demo", "--help"});

    @Test
    void noHelpLineCutsATokenOrEndsInABareEllipsis() {
        for (String[] args : COMMANDS) {
            StringWriter out = new StringWriter();
            StringWriter err = new StringWriter();
            assertEquals(0, ProofrunCommand.run(new PrintWriter(out, true), new PrintWriter(err, true), args));
            String[] lines = out.toString().split("\\R");
            for (int i = 0; i < lines.length; i++) {
                String line = lines[i];
                String where = String.join(" ", args) + ", line " + (i + 1) + ": " + line;
                boolean heading = line.matches("[A-Z][A-Za-z ]*:"); // "Commands:"
                if (i + 1 < lines.length && !heading && CUT_END.matcher(line).matches()) {
                    assertFalse(CONTINUES.matcher(lines[i + 1]).matches(), where + " / " + lines[i + 1]);
                }
                assertFalse(line.replace("]...", "]").contains("..."), where);
                assertFalse(line.contains("\u2026"), where);
            }
        }
    }

    @Test
    void gradeHelpDescribesTheGaugesLongFormAndTheDecimalRule() {
        StringWriter out = new StringWriter();
        assertEquals(0, ProofrunCommand.run(new PrintWriter(out, true), new PrintWriter(new StringWriter(), true), "grade", "--help"));
        String help = out.toString();
        for (String wanted : new String[] {"  plan,slot,characteristic,taken,value", "one reading per row",
            "are its subgroup", "Thousands", "separators are never read."}) {
            org.junit.jupiter.api.Assertions.assertTrue(help.contains(wanted), wanted + " in\n" + help);
        }
    }
}
