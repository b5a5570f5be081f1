package dev.proofrun.text;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.tngtech.archunit.core.domain.JavaClass;
import dev.proofrun.arch.ProductClasses;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

/** Every user-visible message has English text, a unique key, and a template that formats. */
class MessageKeysTest {

    private static final Pattern CONVERSION = Pattern.compile("%(\\d+\\$)?[-#+ 0,(]*\\d*(\\.\\d+)?([a-zA-Z%])");

    static List<MessageKey> allKeys() {
        return ProductClasses.get().stream()
                .filter(c -> c.isEnum() && c.isAssignableTo(MessageKey.class))
                .map(JavaClass::reflect)
                .flatMap(c -> java.util.Arrays.stream(c.getEnumConstants()))
                .map(MessageKey.class::cast)
                .collect(Collectors.toList());
    }

    @Test
    void everyKeyHasTextThatFormats() {
        Set<String> seen = new HashSet<>();
        for (MessageKey key : allKeys()) {
            String id = key.getClass().getName() + "." + key.name();
            assertTrue(seen.add(id), "duplicate key " + id);
            assertFalse(key.english() == null || key.english().isBlank(), "no English text for " + id);
            Matcher m = CONVERSION.matcher(key.english());
            int count = 0;
            while (m.find()) {
                if (!m.group(3).equals("%") && !m.group(3).equals("n")) {
                    count++;
                }
            }
            Object[] args = new Object[count];
            java.util.Arrays.fill(args, null);
            assertDoesNotThrow(() -> key.format(args), "template does not format: " + id);
        }
    }
}
