package org.gyreplan.app.cli;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.Test;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

/** The command line must run on headless servers: it may not link against JavaFX or the desktop package. */
class CliArchitectureTest {
    private final JavaClasses app = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("org.gyreplan.app");

    @Test
    void cliImportsNoJavaFx() {
        noClasses().that().resideInAPackage("org.gyreplan.app.cli..")
                .should().dependOnClassesThat().resideInAnyPackage("javafx..", "org.gyreplan.app.desktop..")
                .because("the CLI loads the desktop app reflectively so that it never needs JavaFX")
                .check(app);
    }

    @Test
    void pipelineScenarioRenderAndReportAreGuiFree() {
        noClasses().that().resideInAnyPackage("org.gyreplan.app.pipeline..", "org.gyreplan.app.scenario..",
                        "org.gyreplan.app.render..", "org.gyreplan.app.report..")
                .should().dependOnClassesThat().resideInAnyPackage("javafx..", "org.gyreplan.app.desktop..",
                        "org.gyreplan.app.cli..", "picocli..")
                .because("the desktop app and the CLI are thin clients of one GUI-free service")
                .check(app);
    }
}
