package org.baywright.report.pdf;

import java.util.List;

/**
 * What was written: the page count and the contents with the page each entry starts on.
 *
 * @param pages number of pages of the PDF
 * @param contents the entries of the contents page, in order
 * @param memberSheets number of member calculation sheets (one per group of identical members)
 * @param membersOnSheets number of members those sheets cover
 */
public record PackageSummary(int pages, List<Entry> contents, int memberSheets, int membersOnSheets) {

    public PackageSummary {
        contents = List.copyOf(contents);
    }

    /**
     * One contents entry.
     *
     * @param level 0 for a part, 1 for a sheet within it
     * @param title as printed in the contents and as the heading on its page
     * @param page 1-based page number
     */
    public record Entry(int level, String title, int page) {
    }
}
