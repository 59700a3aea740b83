package org.inkgate.client.architecture;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.GeneralCodingRules.ACCESS_STANDARD_STREAMS;

import com.tngtech.archunit.base.DescribedPredicate;
import com.tngtech.archunit.core.domain.JavaCall;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;
import com.tngtech.archunit.library.dependencies.SlicesRuleDefinition;
import java.util.Set;
import org.inkgate.packs.broker.PackToolFactory;
import org.inkgate.packs.broker.ResourceBroker;
import org.inkgate.packs.broker.TaskTools;
import org.inkgate.packs.dictionary.Dictionary;
import org.inkgate.packs.glossary.Glossary;
import org.inkgate.packs.spelling.SpellingChecker;
import org.inkgate.packs.spelling.SpellingEngine;

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
    static final ArchRule sittingCourse_isPartOfTheCore = classes()
            .that().haveSimpleName("SittingCourse").or().haveSimpleName("CourseView")
            .should().resideInAPackage("org.inkgate.client.sitting.course")
            .andShould().onlyDependOnClassesThat().resideOutsideOfPackages("javafx..", "org.inkgate.client.sitting.ui..",
                    "org.inkgate.client.task..")
            .because("the sitting's decisions (which screen follows which, time up, pause, recovery, hand-in, next"
                    + " candidate) are tested on the fake clock without a display (issue 13)");

    @ArchTest
    static final ArchRule sittingWindow_changesTheSittingOnlyThroughItsCourse = noClasses()
            .that().resideInAPackage("org.inkgate.client.sitting.ui..")
            .should().dependOnClassesThat().areAssignableTo(org.inkgate.client.sitting.Sitting.class)
            .because("the window renders what SittingCourse decides and forwards people's actions to it; a second"
                    + " caller of the sitting core would be a second place that decides (issue 13)");

    @ArchTest
    static final ArchRule sittingCore_doesNotWriteToStandardStreams = noClasses()
            .that().resideInAPackage("org.inkgate.client.sitting..")
            .and().resideOutsideOfPackage("org.inkgate.client.sitting.ui..")
            .should(ACCESS_STANDARD_STREAMS)
            .because("the sitting core reports through return values and signals; the UI decides what people see");

    @ArchTest
    static final ArchRule onlyTheSittingStore_usesSql = noClasses()
            .that().resideOutsideOfPackage("org.inkgate.client.sitting.store..")
            .should().dependOnClassesThat().resideInAnyPackage("java.sql..", "org.sqlite..")
            .because("the sitting database is read and written only through the store (SqliteProcessLog,"
                    + " SittingStateStore, SittingDatabase), whose writes keep log and state in order (issue 13)");

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

    /** The writing tools a task may be given; each is made by the resource broker from its policy, never by hand. */
    private static final Set<String> TOOLS = Set.of(SpellingChecker.class.getName(), SpellingEngine.class.getName(),
            Glossary.class.getName(), Dictionary.class.getName(), TaskTools.class.getName());

    /** Where a tool can be made: its own constructors and factories, and the broker's tool factory. */
    private static final Set<String> MAKERS = Set.of(SpellingChecker.class.getName(), SpellingEngine.class.getName(),
            Glossary.class.getName(), Dictionary.class.getName(), TaskTools.class.getName(),
            PackToolFactory.class.getName(), org.inkgate.packs.broker.ToolFactory.class.getName());

    private static final DescribedPredicate<JavaCall<?>> MAKES_A_TOOL = DescribedPredicate.describe(
            "constructs a writing tool (its constructor or factory, or the broker's tool factory)",
            call -> TOOLS.contains(call.getTargetOwner().getName()) && call.getTarget().getName().equals("<init>")
                    || MAKERS.contains(call.getTargetOwner().getName())
                            && TOOLS.contains(call.getTarget().getRawReturnType().getName()));

    @ArchTest
    static final ArchRule onlyTheBroker_constructsATool = noClasses()
            .should().callCodeUnitWhere(MAKES_A_TOOL)
            .because("a task gets exactly the tools its policy allows only if every tool comes from"
                    + " ResourceBroker.toolsFor, which reads the policy (issue 13)");

    @ArchTest
    static final ArchRule onlyTheSittingsPacks_makeTheBroker = noClasses()
            .that().resideOutsideOfPackage("org.inkgate.client.sitting.tools..")
            .should().callConstructor(ResourceBroker.class, org.inkgate.packs.broker.ToolFactory.class)
            .orShould().callConstructor(PackToolFactory.class, org.inkgate.packs.broker.PackCatalogue.class,
                    java.nio.file.Path.class, java.time.Clock.class)
            .because("the broker is made over the bundle's verified packs only (sitting.tools.BundlePacks)");

    @ArchTest
    static final ArchRule packages_areFreeOfCycles = SlicesRuleDefinition.slices()
            .matching("org.inkgate.client.(**)")
            .should().beFreeOfCycles()
            .because("each package can then be read, tested and moved on its own (issue 13)");
}
