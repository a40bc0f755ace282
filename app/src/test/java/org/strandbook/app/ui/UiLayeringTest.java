package org.strandbook.app.ui;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.Test;

/** View models, services and the task contract stay free of the scene graph so plain tests can build them. */
class UiLayeringTest {

    private static final JavaClasses UI = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("org.strandbook.app.ui");

    @Test
    void viewModelsDoNotTouchTheSceneGraph() {
        noClasses().that().haveSimpleNameEndingWith("Model")
                .or().haveSimpleNameEndingWith("ViewModel")
                .or().haveSimpleNameEndingWith("Service")
                .or().haveSimpleNameEndingWith("Sheet")
                .or().haveSimpleNameEndingWith("TaskExecutor")
                .should().dependOnClassesThat().resideInAnyPackage("javafx.scene..", "javafx.stage..")
                .because("view models are built and tested without a window (STYLE.md, UI)")
                .check(UI);
    }

    @Test
    void onlyTheFxExecutorReturnsToTheFxThread() {
        noClasses().that().doNotHaveSimpleName("FxTaskExecutor").and().doNotHaveSimpleName("StrandbookWindow")
                .should().dependOnClassesThat().haveFullyQualifiedName("javafx.application.Platform")
                .because("results come back to the FX thread in one place")
                .check(UI);
    }
}
