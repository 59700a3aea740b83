package org.inkgate.client.architecture;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.GeneralCodingRules.ACCESS_STANDARD_STREAMS;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;

/** The client's layering, checked from the start so it never needs an exception. */
@AnalyzeClasses(packages = "org.inkgate.client", importOptions = ImportOption.DoNotIncludeTests.class)
class ArchitectureTest {

    @ArchTest
    static final ArchRule practiceModel_importsNoJavaFx = noClasses()
            .that().resideInAPackage("org.inkgate.client.practice")
            .should().dependOnClassesThat().resideInAPackage("javafx..")
            .because("the practice model is plain data and logic; only practice.ui binds it to JavaFX");

    @ArchTest
    static final ArchRule demoBuild_importsNoJavaFx = noClasses()
            .that().resideInAPackage("org.inkgate.client.demo..")
            .should().dependOnClassesThat().resideInAPackage("javafx..")
            .because("the demo bundle build runs inside Maven, without a display");

    @ArchTest
    static final ArchRule sittingCore_importsNoJavaFx = noClasses()
            .that().resideInAPackage("org.inkgate.client.sitting..")
            .and().resideOutsideOfPackage("org.inkgate.client.sitting.ui..")
            .should().dependOnClassesThat().resideInAPackage("javafx..")
            .because("the sitting core (log, state, timers, recovery, submission) runs and is tested without a display;"
                    + " only sitting.ui binds it to JavaFX");

    @ArchTest
    static final ArchRule sittingCore_doesNotDependOnScreens = noClasses()
            .that().resideInAPackage("org.inkgate.client.sitting..")
            .and().resideOutsideOfPackage("org.inkgate.client.sitting.ui..")
            .should().dependOnClassesThat().resideInAnyPackage("org.inkgate.client.sitting.ui..", "org.inkgate.client.task..")
            .because("the screens and the task workspace call the sitting core, never the other way round");

    @ArchTest
    static final ArchRule sittingCore_doesNotWriteToStandardStreams = noClasses()
            .that().resideInAPackage("org.inkgate.client.sitting..")
            .and().resideOutsideOfPackage("org.inkgate.client.sitting.ui..")
            .should(ACCESS_STANDARD_STREAMS)
            .because("the sitting core reports through return values and signals; the UI decides what people see");

    @ArchTest
    static final ArchRule practiceModel_doesNotDependOnViews = noClasses()
            .that().resideInAPackage("org.inkgate.client.practice")
            .should().dependOnClassesThat().resideInAPackage("org.inkgate.client.practice.ui..");

    @ArchTest
    static final ArchRule views_doNotWriteToStandardStreams = noClasses()
            .that().resideInAPackage("org.inkgate.client.practice..")
            .and().doNotHaveSimpleName("PracticeApp")
            .should(ACCESS_STANDARD_STREAMS)
            .because("only the entry points (Launcher, PracticeApp, DemoBundleBuild) talk to the console");

    @ArchTest
    static final ArchRule sittingViews_doNotWriteToStandardStreams = noClasses()
            .that().resideInAPackage("org.inkgate.client.sitting.ui..")
            .and().doNotHaveSimpleName("SittingApp")
            .should(ACCESS_STANDARD_STREAMS)
            .because("the sitting shows what people need on screen; only its entry point (SittingApp) uses the console");
}
