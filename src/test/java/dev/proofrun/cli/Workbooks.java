package dev.proofrun.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.function.UnaryOperator;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;
import java.util.zip.ZipOutputStream;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/** Returned workbooks for tests: a returned CSV typed into a sheet, and raw edits of a workbook's sheet XML. */
final class Workbooks {

    private Workbooks() {
    }

    /**
     * The CSV's rows as a workbook's sheet "fill-in" (numbers as numbers, other text as text); with
     * {@code notesFirst} a sheet "notes" with a line of text comes before it.
     */
    static void fromCsv(Path csv, Path xlsx, boolean notesFirst) throws IOException {
        // lenient: a spoiled file may hold bytes that are not UTF-8 (a spreadsheet shows them as replacement marks)
        List<String> lines = List.of(new String(Files.readAllBytes(csv), StandardCharsets.UTF_8).split("\r?\n", -1));
        try (XSSFWorkbook wb = new XSSFWorkbook(); OutputStream out = Files.newOutputStream(xlsx)) {
            if (notesFirst) {
                wb.createSheet("notes").createRow(0).createCell(0).setCellValue("returned by the night shift");
            }
            Sheet sheet = wb.createSheet("fill-in");
            for (int r = 0; r < lines.size(); r++) {
                Row row = sheet.createRow(r);
                String[] cells = lines.get(r).split(",", -1);
                for (int c = 0; c < cells.length; c++) {
                    if (cells[c].isEmpty()) {
                        continue;
                    }
                    double number = r > 0 && cells[c].matches("-?[0-9]+(\\.[0-9]+)?([eE]-?[0-9]+)?") ? Double.parseDouble(cells[c]) : Double.NaN;
                    if (Double.isFinite(number)) {
                        row.createCell(c).setCellValue(number);
                    } else {
                        row.createCell(c).setCellValue(cells[c]);
                    }
                }
            }
            wb.write(out);
        }
    }

    /** Rewrites every worksheet's XML in the workbook with {@code edit}; other parts are copied as they are. */
    static void editSheets(Path xlsx, UnaryOperator<String> edit) throws IOException {
        byte[] zipped = Files.readAllBytes(xlsx);
        try (ZipInputStream in = new ZipInputStream(new java.io.ByteArrayInputStream(zipped));
                ZipOutputStream out = new ZipOutputStream(Files.newOutputStream(xlsx))) {
            for (ZipEntry e = in.getNextEntry(); e != null; e = in.getNextEntry()) {
                byte[] content = readAll(in);
                if (e.getName().startsWith("xl/worksheets/sheet")) {
                    content = edit.apply(new String(content, StandardCharsets.UTF_8)).getBytes(StandardCharsets.UTF_8);
                }
                out.putNextEntry(new ZipEntry(e.getName()));
                out.write(content);
                out.closeEntry();
            }
        }
    }

    private static byte[] readAll(InputStream in) throws IOException {
        return in.readAllBytes();
    }
}
