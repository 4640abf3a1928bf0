package org.gyreplan.solver;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.Test;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

/** The solver does no I/O and knows no formats, GUI or CLI (DESIGN.md §1). */
class ArchitectureTest {
    private final JavaClasses solver = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("org.gyreplan.solver");

    @Test
    void solverDoesNoIoAndKnowsNoUi() {
        noClasses().should().dependOnClassesThat().resideInAnyPackage(
                        "java.io..", "java.nio.file..", "java.net..", "javafx..", "java.awt..", "javax.swing..",
                        "picocli..", "com.fasterxml..", "org.gyreplan.gisdata..", "org.gyreplan.app..")
                .because("solver holds physics and numerics only")
                .check(solver);
    }

    @Test
    void solverDoesNotPrint() {
        noClasses().should().accessField(System.class, "out")
                .orShould().accessField(System.class, "err")
                .check(solver);
    }
}
