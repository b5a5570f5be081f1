package dev.proofrun.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.time.DateTimeException;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The fixed-position reader gives what {@link OffsetDateTime#parse(CharSequence)} gives, value and refusal;
 * its epoch seconds are the parsed instant's, or {@link OffsetTimes#NOT_FIXED} for text it leaves to others.
 */
class OffsetTimesTest {

    private static void same(String text) {
        OffsetDateTime expected;
        long epoch = OffsetTimes.epochSecond(text);
        try {
            expected = OffsetDateTime.parse(text);
        } catch (DateTimeException e) {
            assertEquals(OffsetTimes.NOT_FIXED, epoch, text);
            DateTimeException got = assertThrows(DateTimeException.class, () -> OffsetTimes.parse(text), text);
            assertEquals(e.getClass(), got.getClass(), text);
            assertEquals(e.getMessage(), got.getMessage(), text);
            return;
        }
        OffsetDateTime got = OffsetTimes.parse(text);
        assertEquals(expected, got, text); // same local date-time and same offset
        assertEquals(expected.toString(), got.toString(), text);
        if (epoch != OffsetTimes.NOT_FIXED) {
            assertEquals(expected.toEpochSecond(), epoch, text);
        }
    }

    @Test
    void edgesAgreeWithTheFormatter() {
        List<String> cases = List.of("2027-03-01T06:04+01:00", "2027-03-01T06:04:07+01:00", "2027-03-01T06:04:00+01:00",
                "2027-03-01T06:04-05:30", "2027-03-01T06:04-00:00", "2027-03-01T06:04+00:00", "2027-03-01T06:04Z",
                "2027-02-29T06:04+01:00", "2028-02-29T06:04+01:00", "2027-02-30T06:04+01:00", "2027-04-31T06:04+01:00",
                "2027-12-31T23:59:59+14:00", "2027-13-01T06:04+01:00", "2027-00-01T06:04+01:00", "2027-01-00T06:04+01:00",
                "2027-03-01T24:00+01:00", "2027-03-01T06:60+01:00", "2027-03-01T06:04:60+01:00", "2027-03-01T06:04+18:00",
                "2027-03-01T06:04+18:01", "2027-03-01T06:04+01:60", "2027-03-01T06:04*01:00", "2027-03-01t06:04+01:00",
                "2027-03-01 06:04+01:00", "20x7-03-01T06:04+01:00", "2027-03-01T06:04+0100", "2027-03-01T06:04+1:00",
                "0000-01-01T00:00+00:00", "9999-12-31T23:59+01:00", "2027-03-01T06:04:07.5+01:00", "", "2027-03-01",
                "2027-03-01T06:04+01:00[Europe/Berlin]", "２０２７-03-01T06:04+01:00");
        cases.forEach(OffsetTimesTest::same);
        // what the fixed form leaves to the formatter: another shape, a day the month lacks, an offset past 18:00
        for (String other : List.of("2027-03-01T06:04Z", "2027-02-30T06:04+01:00", "2027-03-01T06:04+18:01",
                "2027-03-01T06:04:07.5+01:00")) {
            assertEquals(OffsetTimes.NOT_FIXED, OffsetTimes.epochSecond(other), other);
        }
        assertEquals(OffsetDateTime.parse("2027-03-01T06:04+18:00").toEpochSecond(),
                OffsetTimes.epochSecond("2027-03-01T06:04+18:00"));
    }

    /** 20,000 random instants written the way plan files write them (fixed seed; a mismatch shows the text). */
    @Test
    void randomWrittenTimesReadBackEqual() {
        Random r = new Random(20261202L);
        List<String> texts = new ArrayList<>();
        for (int i = 0; i < 20_000; i++) {
            int offsetMinutes = (r.nextInt(18 * 4 * 2 + 1) - 18 * 4) * 15;
            OffsetDateTime t = OffsetDateTime.of(1900 + r.nextInt(300), 1 + r.nextInt(12), 1, r.nextInt(24), r.nextInt(60),
                    r.nextInt(3) == 0 ? r.nextInt(60) : 0, 0, ZoneOffset.ofTotalSeconds(offsetMinutes * 60))
                    .plusDays(r.nextInt(31));
            texts.add(t.toString());
        }
        texts.forEach(OffsetTimesTest::same);
        // every one with an offset (toString writes a zero offset as Z) is read by the fixed positions
        texts.stream().filter(t -> !t.endsWith("Z"))
                .forEach(t -> assertNotEquals(OffsetTimes.NOT_FIXED, OffsetTimes.epochSecond(t), t));
    }
}
