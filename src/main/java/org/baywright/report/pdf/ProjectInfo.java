package org.baywright.report.pdf;

import java.time.LocalDate;
import java.util.Objects;

/**
 * The project data printed on the cover. Empty strings are left off the cover.
 *
 * @param name project name; empty takes the plan's name
 * @param number the office's job number
 * @param client for whom
 * @param location site or address
 * @param preparedBy who ran the design
 * @param checkedBy who checks it
 * @param revision e.g. "A" or "issued for checking"
 * @param date the date printed on the cover and in the footers (passed in, so a package is reproducible)
 */
public record ProjectInfo(String name, String number, String client, String location, String preparedBy,
        String checkedBy, String revision, LocalDate date) {

    public ProjectInfo {
        name = clean(name);
        number = clean(number);
        client = clean(client);
        location = clean(location);
        preparedBy = clean(preparedBy);
        checkedBy = clean(checkedBy);
        revision = clean(revision);
        Objects.requireNonNull(date, "date");
    }

    /** Only a name and a date. */
    public static ProjectInfo named(String name, LocalDate date) {
        return new ProjectInfo(name, "", "", "", "", "", "", date);
    }

    private static String clean(String s) {
        return s == null ? "" : s.strip();
    }
}
