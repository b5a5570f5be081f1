package dev.proofrun.schedule;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.time.OffsetDateTime;
import java.util.List;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

class SlotTest {

    private static final OffsetDateTime T = OffsetDateTime.parse("2027-03-01T06:04+01:00");

    /** The hand-written id check accepts exactly what the former regex {@code S\d{2,}} accepted. */
    @Test
    void idCheckAgreesWithTheRegex() {
        Pattern regex = Pattern.compile("S\\d{2,}");
        List<String> ids = List.of("S01", "S00", "S001", "S123456", "S1", "S", "", "s01", "S0a", "SS01", "S01 ", " S01",
                "S٠١", "S０１", "S-1", "S+12", "T01", "S1\n");
        for (String id : ids) {
            boolean expected = regex.matcher(id).matches();
            if (expected) {
                assertDoesNotThrow(() -> new Slot(id, T, 5, "A", 0), id);
            } else {
                IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new Slot(id, T, 5, "A", 0), id);
                assertEquals("slot id must look like S07: '" + id + "'", e.getMessage());
            }
        }
        assertThrows(IllegalArgumentException.class, () -> new Slot(null, T, 5, "A", 0));
    }
}
