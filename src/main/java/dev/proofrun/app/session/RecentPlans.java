package dev.proofrun.app.session;

import com.fasterxml.jackson.core.type.TypeReference;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The plans opened lately, most recent first, at most {@value #LIMIT}, kept in {@code recent.json} under
 * the {@link AppHome}. A missing or unreadable list is treated as empty (it is a convenience, not data).
 */
public final class RecentPlans {

    public static final int LIMIT = 8;

    private final Path file;

    public RecentPlans(AppHome home) {
        this.file = home.recentFile();
    }

    /** True before the wizard has ever recorded a plan on this account (the first start). */
    public boolean isFirstStart() {
        return !Files.exists(file);
    }

    public List<Path> list() {
        if (!Files.exists(file)) {
            return List.of();
        }
        try {
            List<String> names = JsonFiles.MAPPER.readValue(file.toFile(), new TypeReference<List<String>>() { });
            return names.stream().map(Path::of).toList();
        } catch (IOException | RuntimeException e) {
            return List.of();
        }
    }

    /**
     * Puts the plan at the top of the list and writes the list. Synchronised: plans are opened and written
     * on different workers, and two read-change-write turns at once would lose one of them.
     */
    public synchronized List<Path> remember(Path plan) {
        Path p = plan.toAbsolutePath().normalize();
        List<Path> now = new ArrayList<>(list());
        now.remove(p);
        now.add(0, p);
        while (now.size() > LIMIT) {
            now.remove(now.size() - 1);
        }
        JsonFiles.write(file, now.stream().map(Path::toString).toList());
        return List.copyOf(now);
    }
}
