package dev.proofrun.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.stats.IndexKind;
import dev.proofrun.text.UserException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CharacteristicsCsvTest {

    @TempDir
    Path dir;

    private Path csv(String text) throws Exception {
        Path p = dir.resolve("chars.csv");
        Files.writeString(p, text);
        return p;
    }

    @Test
    void readsColumnsInAnyOrderWithOptionalOnes() throws Exception {
        List<Characteristic> cs = CharacteristicsCsv.read(csv(
                "Name,ID,unit,lsl,usl,nominal,target,expected,index,expected_cp\n"
                        + "bore,D1,mm,11.98,12.02,12,1.33,1.67,,1.8\n"
                        + "runout,R2,mm,,0.05,,1.33,2.0,ppk,\n"), IndexKind.CPK, 0.95);
        assertEquals(2, cs.size());
        assertEquals(1.8, cs.get(0).expectation().potential().getAsDouble());
        assertEquals(IndexKind.PPK, cs.get(1).requirement().index());
        assertTrue(cs.get(1).limits().lower().isEmpty());
    }

    @Test
    void problemsNameFileRowAndColumn() throws Exception {
        UserException missing = assertThrows(UserException.class, () -> CharacteristicsCsv.read(
                csv("id,name,unit,nominal,lsl,usl,target\nD1,bore,mm,12,11.98,12.02,1.33\n"), IndexKind.CPK, 0.95));
        assertEquals(PlanMessage.CSV_MISSING_COLUMN, missing.key());
        assertTrue(missing.getMessage().contains("column expected"), missing.getMessage());
        UserException reversed = assertThrows(UserException.class, () -> CharacteristicsCsv.read(
                csv("id,name,unit,nominal,lsl,usl,target,expected\nD1,bore,mm,12,11.98,12.02,1.33,1.67\n"
                        + "D2,width,mm,5,5.1,4.9,1.33,1.67\n"), IndexKind.CPK, 0.95));
        assertTrue(reversed.getMessage().contains("chars.csv, row 3, column lsl"), reversed.getMessage());
        UserException twice = assertThrows(UserException.class, () -> CharacteristicsCsv.read(
                csv("id,name,unit,nominal,lsl,usl,target,expected\nD1,a,mm,,1,2,1.33,1.67\nD1,b,mm,,1,2,1.33,1.67\n"),
                IndexKind.CPK, 0.95));
        assertTrue(twice.getMessage().contains("row 3, column id"), twice.getMessage());
    }

    /** The one dialect and the one number rule (text.CsvDialect): a ';' file takes decimal commas; Java-only forms are refused. */
    @Test
    void oneDialectAndOneNumberRule() throws Exception {
        List<Characteristic> cs = CharacteristicsCsv.read(csv("\uFEFFid;name;unit;nominal;lsl;usl;target;expected\n\n"
                + "D1;bore;mm;12;11,98;12,02;1,33;1,67\n"), IndexKind.CPK, 0.95);
        assertEquals(11.98, cs.get(0).limits().lower().getAsDouble(), 0.0);
        UserException javaForm = assertThrows(UserException.class, () -> CharacteristicsCsv.read(
                csv("id,name,unit,nominal,lsl,usl,target,expected\n\nD1,bore,mm,12,11.98,12.02d,1.33,1.67\n"), IndexKind.CPK, 0.95));
        assertTrue(javaForm.getMessage().contains("chars.csv, row 3, column usl"), javaForm.getMessage());
    }
}
