package dev.proofrun.grade;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.text.CsvDialect;
import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.time.ZoneId;
import java.time.ZonedDateTime;
import java.util.Locale;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The fast paths of {@link CellValues} give exactly what the general paths give: the same double as
 * {@link Double#parseDouble} (bit for bit) and the same instant as {@link CellValues#taken}. The reference is the
 * JDK's own parser, not a recalled value.
 */
class CellValuesTest {

    private static final ZoneId ZONE = ZoneId.of("Europe/Berlin");
    private static final LocalDate DAY = LocalDate.of(2027, 3, 1);

    private static void sameAsJdk(String text) {
        double expected = Double.parseDouble(text.replace(',', '.'));
        double got = CsvDialect.number(text);
        assertEquals(Double.doubleToRawLongBits(expected), Double.doubleToRawLongBits(got), text);
    }

    @Test
    void fastNumbersAreBitForBitTheJdksParse() {
        // seeded: 200,000 random decimals of 1–15 digits with 0–15 after the mark, either sign and mark;
        // every one must match exactly, so there is no tolerance to choose
        SplittableRandom rng = new SplittableRandom(6);
        for (int i = 0; i < 200_000; i++) {
            int digits = 1 + rng.nextInt(15);
            int after = rng.nextInt(digits + 1);
            StringBuilder sb = new StringBuilder();
            if (rng.nextInt(4) == 0) {
                sb.append(rng.nextBoolean() ? '-' : '+');
            }
            for (int d = 0; d < digits; d++) {
                if (d == digits - after && after > 0) {
                    sb.append(rng.nextInt(3) == 0 ? ',' : '.');
                }
                sb.append((char) ('0' + rng.nextInt(10)));
            }
            sameAsJdk(sb.toString());
        }
    }

    @Test
    void edgesOfTheFastPath() {
        for (String s : new String[] {"0", "-0", "+0", "-0.0", "5.", ".5", ",5", "999999999999999", "0.000000000000001",
            "9007199254740993", "1234567890123456", "0.1234567890123456", "22.0012", "10,0125", "1e5", "1.5E-3",
            "000000000000000000001.5", "-123456789.012345"}) {
            sameAsJdk(s);
        }
    }

    private static void sameInstant(String text) {
        ZonedDateTime slow = CellValues.taken(text, ZONE, DAY);
        long fast = CellValues.takenEpochSecond(text, ZONE, DAY);
        if (slow == null) {
            assertEquals(CellValues.NOT_A_TIME, fast, text);
        } else {
            assertEquals(slow.toEpochSecond(), fast, text);
        }
    }

    @Test
    void fastTimesAreTheSameInstantAsTheGeneralParse() {
        SplittableRandom rng = new SplittableRandom(7);
        for (int i = 0; i < 20_000; i++) {
            OffsetDateTime t = OffsetDateTime.of(2000 + rng.nextInt(60), 1 + rng.nextInt(12), 1 + rng.nextInt(28),
                    rng.nextInt(24), rng.nextInt(60), rng.nextInt(60), 0,
                    java.time.ZoneOffset.ofTotalSeconds(900 * (rng.nextInt(4 * 28) - 4 * 14)));
            String off = t.getOffset().getTotalSeconds() == 0 ? "+00:00" : t.getOffset().getId();
            String text = String.format(Locale.ROOT, "%04d-%02d-%02dT%02d:%02d", t.getYear(), t.getMonthValue(),
                    t.getDayOfMonth(), t.getHour(), t.getMinute());
            if (rng.nextBoolean()) {
                text += String.format(Locale.ROOT, ":%02d", t.getSecond());
            }
            sameInstant(text + off);
        }
    }

    @Test
    void malformedTimesFallBackAndAreRefusedAlike() {
        for (String s : new String[] {"2027-02-30T06:00+01:00", "2027-13-01T06:00+01:00", "2027-03-01T24:00+01:00",
            "2027-03-01T06:60+01:00", "2027-03-01T06:00+19:00", "2027-03-01T06:00*01:00", "2027-03-01X06:00+01:00",
            "2027-03-01T06:00:61+01:00", "2027-03-01T06:00Z", "2027-03-01 06:00", "06:52", "2028-02-29T06:00-05:30",
            "2027-03-01T06:00+1:000", "20a7-03-01T06:00+01:00"}) {
            sameInstant(s);
        }
        assertEquals(CellValues.NOT_A_TIME, CellValues.takenEpochSecond("2027-02-30T06:00+01:00", ZONE, DAY));
        assertTrue(CellValues.takenEpochSecond("2028-02-29T06:00-05:30", ZONE, DAY) != CellValues.NOT_A_TIME);
    }
}
