// SPDX-License-Identifier: Apache-2.0
// Copyright 2026 The wurtzkit developers
package org.wurtzkit.solvers.workflow;

import java.util.ArrayList;
import java.util.List;
import org.wurtzkit.units.Decimals;

/** The aligned text of {@link CsvTable#preview(int)}. */
final class TableText {
    /** Column separator. */
    private static final String GAP = "  ";

    private TableText() {
    }

    /**
     * @param table   a table
     * @param maxRows most rows shown, &ge; 2; a longer table shows its first maxRows - maxRows / 2
     *                and last maxRows / 2 rows
     * @return the text
     */
    static String render(CsvTable table, int maxRows) {
        int n = table.rowCount();
        List<String> headers = table.headers();
        List<List<String>> lines = new ArrayList<>();
        lines.add(headers);
        int tail = n > maxRows ? maxRows / 2 : 0;
        int head = n > maxRows ? maxRows - tail : n;
        for (int i = 0; i < head; i++) {
            lines.add(shorten(table.row(i)));
        }
        for (int i = n - tail; i < n; i++) {
            lines.add(shorten(table.row(i)));
        }
        int[] width = new int[headers.size()];
        for (List<String> l : lines) {
            for (int c = 0; c < width.length; c++) {
                width[c] = Math.max(width[c], l.get(c).length());
            }
        }
        StringBuilder sb = new StringBuilder();
        for (int k = 0; k < lines.size(); k++) {
            if (k > 0) {
                sb.append('\n');
            }
            if (tail > 0 && k == head + 1) {
                sb.append("... (").append(n - head - tail).append(" more rows)\n");
            }
            List<String> l = lines.get(k);
            StringBuilder line = new StringBuilder();
            for (int c = 0; c < width.length; c++) {
                if (c > 0) {
                    line.append(GAP);
                }
                line.append(l.get(c));
                if (c + 1 < width.length) {
                    line.append(" ".repeat(width[c] - l.get(c).length()));
                }
            }
            sb.append(line.toString().stripTrailing());
        }
        return sb.toString();
    }

    /** Numbers to six significant digits; empty cells and text unchanged. */
    private static List<String> shorten(List<String> cells) {
        List<String> out = new ArrayList<>(cells.size());
        for (String c : cells) {
            out.add(isNumber(c) ? Decimals.format(Double.parseDouble(c)) : c);
        }
        return out;
    }

    private static boolean isNumber(String c) {
        if (c.isEmpty()) {
            return false;
        }
        char first = c.charAt(0);
        if (!(Character.isDigit(first) || first == '-' || first == '.' || first == '+')) {
            return false; // also keeps "NaN" and "Infinity" from the parser
        }
        try {
            Double.parseDouble(c);
            return true;
        } catch (NumberFormatException e) {
            return false;
        }
    }
}
