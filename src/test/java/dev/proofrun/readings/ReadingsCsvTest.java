package dev.proofrun.readings;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.proofrun.text.UserException;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.OptionalInt;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ReadingsCsvTest {

    @TempDir
    Path dir;

    private Path write(String text) throws IOException {
        Path p = dir.resolve("r.csv");
        Files.writeString(p, text, StandardCharsets.UTF_8);
        return p;
    }

    private UserException fails(String text, OptionalInt size) throws IOException {
        Path p = write(text);
        return assertThrows(UserException.class, () -> ReadingsCsv.read(p, size));
    }

    @Test
    void valueColumnGivesIndividualsOrConsecutiveSubgroups() throws IOException {
        Path p = write("part,Value\nA,1.5\nB,2\n\nC,-0.25\nD,1e-1\n");
        Readings ind = ReadingsCsv.read(p, OptionalInt.empty());
        assertEquals(4, ind.count());
        assertEquals(4, ind.subgroups().size());
        assertEquals(SubgroupLayout.VALUES, ind.layout());
        Readings pairs = ReadingsCsv.read(p, OptionalInt.of(2));
        assertArrayEquals(new double[] {1.5, 2}, pairs.subgroups().get(0));
        assertArrayEquals(new double[] {-0.25, 0.1}, pairs.subgroups().get(1));
    }

    @Test
    void subgroupColumnGroupsByLabelInFirstSeenOrder() throws IOException {
        Readings r = ReadingsCsv.read(write("\uFEFFsubgroup,value\nS2,1\nS1,2\nS2,3\nS1,4\nS1,5\n"), OptionalInt.empty());
        assertEquals(SubgroupLayout.LABELLED, r.layout());
        assertArrayEquals(new double[] {1, 3}, r.subgroups().get(0));
        assertArrayEquals(new double[] {2, 4, 5}, r.subgroups().get(1));
    }

    @Test
    void wideRowsAreSubgroups() throws IOException {
        Readings r = ReadingsCsv.read(write("slot,x1,x2,x3\nS01,1,2,3\nS02,4,,6\n"), OptionalInt.empty());
        assertEquals(SubgroupLayout.WIDE, r.layout());
        assertEquals(5, r.count());
        assertArrayEquals(new double[] {4, 6}, r.subgroups().get(1));
    }

    /**
     * The one dialect (issue 16): the same cells read alike in a returned file and a file of readings — a
     * {@code ;} file with decimal commas, and a quoted decimal comma in a {@code ,} file.
     */
    @Test
    void semicolonFilesAndDecimalCommasReadAsReturnedFilesDo() throws IOException {
        Readings semi = ReadingsCsv.read(write("subgroup;value\nS1;22,001\nS1;21,999\nS2;22,0005\nS2;1,5e1\n"), OptionalInt.empty());
        assertEquals(SubgroupLayout.LABELLED, semi.layout());
        assertArrayEquals(new double[] {22.001, 21.999}, semi.subgroups().get(0));
        assertArrayEquals(new double[] {22.0005, 15.0}, semi.subgroups().get(1));
        Readings quoted = ReadingsCsv.read(write("x1,x2\n1,2\n3,\"1,5\"\n"), OptionalInt.empty());
        assertArrayEquals(new double[] {3, 1.5}, quoted.subgroups().get(1));
    }

    @Test
    void badInputNamesFileRowAndColumn() throws IOException {
        UserException e = fails("value\n1\nabc\n", OptionalInt.empty());
        assertEquals(ReadingsMessage.NOT_A_NUMBER, e.key());
        assertEquals(dir.resolve("r.csv") + ", row 3, column value: not a number: 'abc'", e.getMessage());
        assertEquals(ReadingsMessage.EXTRA_CELLS, fails("x1,x2\n1,2\n3,1,5\n", OptionalInt.empty()).key());
        UserException comma = fails("x1,x2\n1,2\n3,\"1,5,0\"\n", OptionalInt.empty());
        assertEquals(3, comma.location().orElseThrow().row());
        assertEquals("x2", comma.location().orElseThrow().column());
        assertEquals(ReadingsMessage.NOT_A_NUMBER, fails("value\n1\n0x1p3\n", OptionalInt.empty()).key());
        assertEquals(ReadingsMessage.NOT_FINITE, fails("value\n1\nNaN\n", OptionalInt.empty()).key());
        assertEquals(ReadingsMessage.NOT_FINITE, fails("value\n1\n1e999\n", OptionalInt.empty()).key());
        assertEquals(ReadingsMessage.EMPTY_FILE, fails("", OptionalInt.empty()).key());
        assertEquals(ReadingsMessage.NO_HEADER, fails("1.0\n2.0\n", OptionalInt.empty()).key());
        assertEquals(ReadingsMessage.TOO_FEW_READINGS, fails("value\n1\n", OptionalInt.empty()).key());
        assertEquals(ReadingsMessage.TOO_FEW_READINGS, fails("value\n", OptionalInt.empty()).key());
        assertEquals(ReadingsMessage.MISSING_VALUE, fails("part,value\nA,1\nB,\n", OptionalInt.empty()).key());
        assertEquals(ReadingsMessage.MISSING_COLUMN, fails("x1,x3\n1,2\n", OptionalInt.empty()).key());
        assertEquals(ReadingsMessage.MISSING_LABEL, fails("subgroup,value\n,1\n", OptionalInt.empty()).key());
        assertEquals(ReadingsMessage.EMPTY_ROW, fails("a,x1,x2\nq,,\n", OptionalInt.empty()).key());
        assertEquals(ReadingsMessage.BAD_CSV, fails("value\n1\n\"2\n", OptionalInt.empty()).key());
        UserException partial = fails("value\n1\n2\n3\n4\n5\n", OptionalInt.of(2));
        assertEquals(ReadingsMessage.INCOMPLETE_SUBGROUP, partial.key());
        assertEquals(6, partial.location().orElseThrow().row());
        assertEquals(ReadingsMessage.SIZE_WITH_SUBGROUPS, fails("x1,x2\n1,2\n", OptionalInt.of(2)).key());
        assertEquals(ReadingsMessage.NOT_FOUND,
                assertThrows(UserException.class, () -> ReadingsCsv.read(dir.resolve("none.csv"), OptionalInt.empty())).key());
    }
}
