package dev.proofrun.app.session;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.Optional;

/**
 * Autosaved drafts: each plan file has a side file {@code name.draft.json} beside it, a plan never saved
 * has {@code untitled.draft.json} in the {@link AppHome}. A draft is removed once its content is saved
 * into the plan file.
 */
public final class DraftStore {

    private final AppHome home;

    public DraftStore(AppHome home) {
        this.home = home;
    }

    public Path sideFile(Path planFile) {
        return home.draftFor(planFile);
    }

    public void write(DraftSnapshot s) {
        JsonFiles.write(sideFile(s.planFile().isEmpty() ? null : Path.of(s.planFile())), s);
    }

    /**
     * The draft of the plan if one exists and is newer than the plan file itself (an older one was
     * overtaken by a save made elsewhere).
     */
    public Optional<DraftSnapshot> newerDraft(Path planFile) {
        Path side = sideFile(planFile);
        if (!Files.exists(side)) {
            return Optional.empty();
        }
        try {
            if (planFile != null && Files.exists(planFile)) {
                FileTime plan = Files.getLastModifiedTime(planFile);
                if (Files.getLastModifiedTime(side).compareTo(plan) < 0) {
                    return Optional.empty();
                }
            }
            DraftSnapshot s = JsonFiles.MAPPER.readValue(side.toFile(), DraftSnapshot.class);
            return s.format() == DraftSnapshot.FORMAT ? Optional.of(s) : Optional.empty();
        } catch (IOException | RuntimeException e) {
            return Optional.empty();
        }
    }

    public void discard(Path planFile) {
        try {
            Files.deleteIfExists(sideFile(planFile));
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }
}
