package org.wurtzkit.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import javax.imageio.ImageIO;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/** Checks on the files the examples write. */
final class Outputs {
    private Outputs() {
    }

    /**
     * Reads a PNG back and checks its size and that it shows something: many colours, and neither
     * almost all white nor almost all ink.
     */
    static BufferedImage assertPng(Path file, int width, int height) throws IOException {
        assertTrue(Files.size(file) > 10_000, file + " is suspiciously small: " + Files.size(file) + " bytes");
        BufferedImage img = ImageIO.read(file.toFile());
        assertNotNull(img, file + " is not a readable image");
        assertEquals(width, img.getWidth(), file + " width");
        assertEquals(height, img.getHeight(), file + " height");
        Set<Integer> colours = new HashSet<>();
        long white = 0;
        for (int y = 0; y < img.getHeight(); y += 2) {
            for (int x = 0; x < img.getWidth(); x += 2) {
                int rgb = img.getRGB(x, y) & 0xffffff;
                colours.add(rgb);
                if (rgb == 0xffffff) {
                    white++;
                }
            }
        }
        double whiteShare = white / ((img.getWidth() / 2.0) * (img.getHeight() / 2.0));
        assertTrue(colours.size() > 50, file + " has only " + colours.size() + " colours");
        assertTrue(whiteShare > 0.02 && whiteShare < 0.98, file + " is " + (100 * whiteShare) + " % white");
        return img;
    }

    /**
     * Reads a CSV file and checks that it opens with the comment line that calls its data invented,
     * that its header is exactly the expected one and that every row has one cell per column.
     *
     * @return the records
     */
    static List<CSVRecord> assertCsv(Path file, List<String> header) throws IOException {
        String first = Files.readAllLines(file, StandardCharsets.UTF_8).get(0);
        assertEquals("# " + Tables.NOTE, first, file + " first line");
        assertTrue(first.contains("invented demo data"), first);
        try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8);
                CSVParser p = CSVFormat.RFC4180.builder().setCommentMarker('#').setHeader().setSkipHeaderRecord(true)
                        .get().parse(r)) {
            assertEquals(header, p.getHeaderNames(), file + " header");
            List<CSVRecord> rows = p.getRecords();
            assertTrue(rows.size() > 0, file + " has no rows");
            for (CSVRecord row : rows) {
                assertEquals(header.size(), row.size(), file + " row " + row.getRecordNumber());
            }
            return rows;
        }
    }

    /** Every physical column's header ends in its unit. */
    static void assertUnits(List<String> header, Set<String> dimensionless) {
        for (String h : header) {
            if (dimensionless.contains(h)) {
                continue;
            }
            boolean unit = h.matches(".*_(nm|eV|V|cm\\^-2|cm\\^-3|C/m\\^2|F/m\\^2|uF/cm\\^2|MV/cm|nm\\^-1|m0)");
            assertTrue(unit, "header " + h + " names no unit");
        }
    }
}
