package dev.proofrun;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.Map;
import org.junit.jupiter.api.Test;

/** Starting the wizard without a screen is said in one line, not a stack trace. */
class MainTest {

    @Test
    void noDisplayOnLinuxIsNamed() {
        assertEquals("neither DISPLAY nor WAYLAND_DISPLAY is set", Main.missingDisplay("Linux", Map.of(), null));
        assertEquals("neither DISPLAY nor WAYLAND_DISPLAY is set",
                Main.missingDisplay("Linux", Map.of("DISPLAY", " "), null));
    }

    @Test
    void aDisplayAnExplicitPlatformOrAnotherSystemIsLeftAlone() {
        assertNull(Main.missingDisplay("Linux", Map.of("DISPLAY", ":0"), null));
        assertNull(Main.missingDisplay("Linux", Map.of("WAYLAND_DISPLAY", "wayland-0"), null));
        assertNull(Main.missingDisplay("Linux", Map.of(), "Monocle"));
        assertNull(Main.missingDisplay("Windows 11", Map.of(), null));
        assertNull(Main.missingDisplay("Mac OS X", Map.of(), null));
    }

    @Test
    void theLineSaysWhatToDo() {
        String line = LaunchMessage.NO_DISPLAY.format("neither DISPLAY nor WAYLAND_DISPLAY is set");
        assertEquals(-1, line.indexOf('\n'));
        assertEquals(true, line.contains("xvfb-run -a java -jar proofrun.jar") && line.contains("--help"));
    }
}
