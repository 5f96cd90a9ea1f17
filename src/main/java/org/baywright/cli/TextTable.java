package org.baywright.cli;

import java.util.ArrayList;
import java.util.List;

/** A plain-text table with columns padded to their widest cell; numbers right-aligned. */
final class TextTable {
    private final List<String[]> rows = new ArrayList<>();
    private final boolean[] right;

    TextTable(boolean[] rightAligned, String... header) {
        this.right = rightAligned;
        rows.add(header);
    }

    TextTable row(String... cells) {
        rows.add(cells);
        return this;
    }

    String render(String indent) {
        int n = rows.get(0).length;
        int[] w = new int[n];
        for (String[] r : rows) {
            for (int i = 0; i < n; i++) {
                w[i] = Math.max(w[i], r[i].length());
            }
        }
        StringBuilder sb = new StringBuilder();
        for (int k = 0; k < rows.size(); k++) {
            String[] r = rows.get(k);
            StringBuilder line = new StringBuilder(indent);
            for (int i = 0; i < n; i++) {
                String c = r[i];
                String pad = " ".repeat(w[i] - c.length());
                line.append(right[i] && k > 0 ? pad + c : c + pad);
                if (i + 1 < n) {
                    line.append("  ");
                }
            }
            sb.append(line.toString().stripTrailing()).append('\n');
            if (k == 0) {
                int total = 0;
                for (int x : w) {
                    total += x;
                }
                sb.append(indent).append("-".repeat(total + 2 * (n - 1))).append('\n');
            }
        }
        return sb.toString();
    }
}
