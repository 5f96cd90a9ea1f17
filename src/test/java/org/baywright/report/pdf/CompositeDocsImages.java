package org.baywright.report.pdf;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import org.baywright.catalog.CatalogFile;
import org.baywright.plan.CompositeMode;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Plan;
import org.baywright.plan.RegularPlan;
import org.baywright.plan.Slab;
import org.baywright.report.drawing.DrawingExport;
import org.baywright.report.drawing.DrawingOptions;
import org.baywright.report.drawing.Paper;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.units.UnitSystem;

/**
 * Writes the composite samples of {@code docs/calculation-package.md} and {@code docs/drawing.md} into
 * {@code target/}: the package and the framing plan of a regular plan with the typical slab (2 × 2 bays of
 * 30 ft × 45 ft, beams at 10 ft; {@link Slab#typical()}). Turn the page with a composite section into a PNG
 * with poppler: {@code pdftoppm -png -r 80 -f N -l N -singlefile target/composite-package.pdf
 * docs/images/calc-composite-section}. Run from the project folder after a deliberate change to their look.
 */
public final class CompositeDocsImages {
    private CompositeDocsImages() {
    }

    public static void main(String[] args) throws Exception {
        double ft = 0.3048;
        double psf = 4.4482216152605 / (ft * ft);
        Plan base = RegularPlan.generate(new RegularPlan.Spec("Composite bays", "us", List.of(30 * ft, 30 * ft),
                List.of(45 * ft, 45 * ft), List.of(13 * ft, 13 * ft), true, 10 * ft, new LoadValues(50 * psf, 10 * psf, 100 * psf, 0, 0, 0),
                new LoadValues(40 * psf, 10 * psf, 0, 20 * psf, 0, 0), LoadValues.ZERO));
        RunResult run = PlanRun.run(RegularPlan.withSlab(base, Slab.typical(), CompositeMode.COMPOSITE, 0), CatalogFile.loadDefault());
        Files.createDirectories(Path.of("target"));
        CalculationPackage.write(run, Path.of("target/composite-package.pdf"),
                new PackageOptions(UnitSystem.US, ProjectInfo.named("Composite bays", LocalDate.of(2026, 12, 2)), 0));
        DrawingExport.write(run, run.plan().levels().get(0).name(), Path.of("target/composite-plan.png"),
                DrawingOptions.defaults().withPaper(Paper.ANSI_B).withDate("2026-12-02").withDpi(100));
        System.out.println("wrote target/composite-package.pdf and target/composite-plan.png");
    }
}
