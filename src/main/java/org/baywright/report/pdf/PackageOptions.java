package org.baywright.report.pdf;

import java.time.LocalDate;
import java.util.Objects;
import org.baywright.units.UnitSystem;

/**
 * How a calculation package is written.
 *
 * @param units the unit system every number is printed in; US pages are Letter, SI pages A4
 * @param project the cover's project data
 * @param allowancePercent the takeoff's allowance for connections and miscellaneous steel, 0 to 100,
 *     shown separately from the member weight
 */
public record PackageOptions(UnitSystem units, ProjectInfo project, double allowancePercent) {

    public PackageOptions {
        Objects.requireNonNull(units, "units");
        Objects.requireNonNull(project, "project");
        if (!(allowancePercent >= 0) || allowancePercent > 100) {
            throw new IllegalArgumentException("the takeoff allowance must be a percentage from 0 to 100, got "
                    + allowancePercent);
        }
    }

    /** The given units, the plan's name as the project, today's date and no allowance. */
    public static PackageOptions of(UnitSystem units) {
        return new PackageOptions(units, ProjectInfo.named("", LocalDate.now()), 0);
    }

    public PackageOptions withProject(ProjectInfo p) {
        return new PackageOptions(units, p, allowancePercent);
    }

    public PackageOptions withAllowance(double percent) {
        return new PackageOptions(units, project, percent);
    }
}
