package org.baywright.architecture;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The dependency rules of the house plan, executed: docs/architecture.md, "Layer rules", lists each
 * rule with the name of the method here that checks it (the top level is checked by {@link TopLevelTest}).
 */
class ArchitectureTest {
    private static JavaClasses classes;

    @BeforeAll
    static void importMain() {
        classes = new ClassFileImporter()
                .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.baywright");
    }

    @Test
    void onlyTheUiImportsJavaFx() {
        noClasses().that().resideOutsideOfPackage("org.baywright.ui..")
                .should().dependOnClassesThat().resideInAnyPackage("javafx..")
                .allowEmptyShould(true).check(classes);
    }

    @Test
    void viewModelsNeedNoToolkit() {
        // view-models hold state and texts and are tested with plain JUnit: observable values and
        // collections (javafx.beans, javafx.collections) are fine; nodes and controls (javafx.scene),
        // windows and the application belong to the views. The same holds for the plain helpers the
        // views take their texts from, nested classes included.
        noClasses().that().haveNameMatching("org\\.baywright\\..*ViewModel(\\$.*)?")
                .or().haveNameMatching("org\\.baywright\\.ui\\.(EditorModel|StudyPanelModel|NewPlanForm|Readouts|ToolValues"
                        + "|DocumentRuns)(\\$.*)?")
                .should().dependOnClassesThat().resideInAnyPackage("javafx.scene..", "javafx.stage..", "javafx.application..")
                .check(classes);
    }

    @Test
    void onlyIoImportsJackson() {
        noClasses().that().resideOutsideOfPackage("org.baywright.io..")
                .should().dependOnClassesThat().resideInAnyPackage("com.fasterxml.jackson..")
                .check(classes);
    }

    @Test
    void onlyTheWorkbookPackageImportsPoi() {
        noClasses().that().resideOutsideOfPackage("org.baywright.report.workbook..")
                .should().dependOnClassesThat().resideInAnyPackage("org.apache.poi..")
                .check(classes);
    }

    @Test
    void onlyGeometryImportsJts() {
        noClasses().that().resideOutsideOfPackage("org.baywright.geometry..")
                .should().dependOnClassesThat().resideInAnyPackage("org.locationtech.jts..")
                .check(classes);
    }

    @Test
    void designCodesKnowNothingOfThePlanTheRunOrTheUi() {
        noClasses().that().resideInAnyPackage("org.baywright.design.aisc360..", "org.baywright.design.dg11..")
                .should().dependOnClassesThat().resideInAnyPackage("org.baywright.plan..", "org.baywright.takedown..",
                        "org.baywright.run..", "org.baywright.ui..", "org.baywright.cli..", "org.baywright.io..",
                        "org.baywright.geometry..", "org.baywright.report..", "org.baywright.study..")
                .check(classes);
    }

    @Test
    void theDesignersKnowNothingOfThePlanTheTakedownOrTheRun() {
        // design (beam and column designers) takes plain values: loads, criteria, catalog, storey demands
        noClasses().that().resideInAPackage("org.baywright.design..")
                .should().dependOnClassesThat().resideInAnyPackage("org.baywright.plan..", "org.baywright.takedown..",
                        "org.baywright.run..", "org.baywright.geometry..", "org.baywright.report..", "org.baywright.study..",
                        "org.baywright.io..", "org.baywright.ui..", "org.baywright.cli..")
                .check(classes);
    }

    @Test
    void designCodesDoNotImportEachOther() {
        // each design.<code> package (aisc360, later en1993…) stands alone
        slices().matching("org.baywright.design.(*)..").should().notDependOnEachOther().check(classes);
    }

    @Test
    void theEngineNeverImportsTheFrontEnds() {
        noClasses().that().resideOutsideOfPackages("org.baywright.cli..", "org.baywright.ui..", "org.baywright")
                .should().dependOnClassesThat().resideInAnyPackage("org.baywright.cli..", "org.baywright.ui..")
                .check(classes);
    }

    @Test
    void cliAndUiAreSiblings() {
        noClasses().that().resideInAPackage("org.baywright.cli..")
                .should().dependOnClassesThat().resideInAPackage("org.baywright.ui..").check(classes);
        noClasses().that().resideInAPackage("org.baywright.ui..")
                .should().dependOnClassesThat().resideInAPackage("org.baywright.cli..")
                .allowEmptyShould(true).check(classes);
    }

    @Test
    void lowLayersStayLow() {
        noClasses().that().resideInAnyPackage("org.baywright.units..", "org.baywright.calc..", "org.baywright.analysis..",
                "org.baywright.load..", "org.baywright.catalog..")
                .should().dependOnClassesThat().resideInAnyPackage("org.baywright.design..", "org.baywright.plan..",
                        "org.baywright.takedown..", "org.baywright.run..", "org.baywright.report..", "org.baywright.io..")
                .check(classes);
    }

    @Test
    void planFilesKnowOnlyTheModel() {
        noClasses().that().resideInAPackage("org.baywright.io..")
                .should().dependOnClassesThat().resideInAnyPackage("org.baywright.takedown..", "org.baywright.run..",
                        "org.baywright.report..", "org.baywright.design..", "org.baywright.geometry..", "org.baywright.cli..",
                        "org.baywright.study..")
                .check(classes);
    }

    @Test
    void noCyclesBetweenPackages() {
        slices().matching("org.baywright.(*)..").should().beFreeOfCycles().check(classes);
    }
}
