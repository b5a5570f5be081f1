package dev.proofrun.sheet;

import dev.proofrun.plan.StudyPlan;
import dev.proofrun.paper.Paper;
import dev.proofrun.text.AtomicFile;
import dev.proofrun.text.Location;
import dev.proofrun.text.UserException;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;

/**
 * Writes the three files of a collection sheet into a directory: {@code <plan id>-sheet.pdf},
 * {@code <plan id>-fill-in.csv} and {@code <plan id>-fill-in.xlsx}.
 *
 * <p>All three are written to temporary files in the directory first and moved into place only when all
 * three are complete, so a failure leaves no partial file behind (files of an earlier run with the same
 * names are replaced only on success).
 */
public final class SheetFiles {

    /**
     * The files written.
     *
     * @param pdf  the printed sheet
     * @param csv  the fill-in CSV
     * @param xlsx the fill-in workbook
     */
    public record Written(Path pdf, Path csv, Path xlsx) {
        /** The three paths in the order the command prints them. */
        public List<Path> all() {
            return List.of(pdf, csv, xlsx);
        }
    }

    private SheetFiles() {
    }

    /**
     * Writes the sheet files for a plan.
     *
     * @param plan       the plan
     * @param dir        the output directory; created if missing
     * @param paper      A4 or Letter
     * @param allowDraft whether an unissued plan may be printed (marked DRAFT)
     * @return the paths written
     * @throws UserException if the plan is a draft and drafts are not allowed, the directory is a file, or
     *                       writing fails
     */
    public static Written write(StudyPlan plan, Path dir, Paper paper, boolean allowDraft) {
        if (!plan.isIssued() && !allowDraft) {
            throw new UserException(SheetMessage.DRAFT_REFUSED, plan.id());
        }
        if (Files.exists(dir) && !Files.isDirectory(dir)) {
            throw new UserException(Location.file(dir.toString()), SheetMessage.OUT_NOT_DIRECTORY, dir);
        }
        Written target = new Written(dir.resolve(plan.id() + "-sheet.pdf"), dir.resolve(plan.id() + "-fill-in.csv"),
                dir.resolve(plan.id() + "-fill-in.xlsx"));
        List<AtomicFile.Pending> files = new ArrayList<>();
        try {
            Files.createDirectories(dir);
            // The workbook is written on a second thread while the PDF is laid out: on a fresh JVM most of
            // the time is class loading of PDFBox and POI, which two cores do side by side.
            CompletableFuture<AtomicFile.Pending> xlsx = CompletableFuture.supplyAsync(() -> {
                try {
                    return pending(target.xlsx(), out -> FillInXlsx.write(plan, out));
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            });
            try {
                files.add(pending(target.pdf(), out -> SheetPdf.write(plan, paper, out)));
                files.add(pending(target.csv(), out -> FillInCsv.write(plan, out)));
            } finally {
                files.add(join(xlsx));
            }
            for (AtomicFile.Pending f : files) {
                f.commit();
            }
            return target;
        } catch (IOException | UncheckedIOException e) {
            throw new UserException(Location.file(dir.toString()), SheetMessage.WRITE_FAILED, e.getMessage());
        } finally {
            files.forEach(AtomicFile.Pending::close);
        }
    }

    /** The result of the workbook thread; its failure surfaces here as the I/O failure it was. */
    private static AtomicFile.Pending join(CompletableFuture<AtomicFile.Pending> f) throws IOException {
        try {
            return f.join();
        } catch (CompletionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof UncheckedIOException u) {
                throw u.getCause();
            }
            if (cause instanceof RuntimeException r) {
                throw r;
            }
            throw new IOException(cause);
        }
    }

    /** The file's content written to its temporary file; moved into place when all three are complete. */
    private static AtomicFile.Pending pending(Path file, AtomicFile.Body body) throws IOException {
        AtomicFile.Pending p = AtomicFile.begin(file);
        try {
            p.write(body);
            return p;
        } catch (IOException | RuntimeException e) {
            p.close();
            throw e;
        }
    }
}
