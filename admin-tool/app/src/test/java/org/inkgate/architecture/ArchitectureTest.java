package org.inkgate.architecture;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.domain.properties.HasSourceCodeLocation;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.core.importer.Location;
import com.tngtech.archunit.lang.ArchRule;
import java.util.Collection;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Stream;
import org.inkgate.architecture.fixtures.admin.app.CommandLineMain;
import org.inkgate.architecture.fixtures.admin.app.CommandWithConnection;
import org.inkgate.architecture.fixtures.admin.app.StepOpeningSqliteStore;
import org.inkgate.architecture.fixtures.admin.core.RosterPrinter;
import org.inkgate.architecture.fixtures.admin.core.store.sqlite.SqliteFixtureStore;
import org.inkgate.architecture.fixtures.analysis.AnalysisReadingBundle;
import org.inkgate.architecture.fixtures.analysis.AnalysisReadingRoster;
import org.inkgate.architecture.fixtures.analysis.AnalysisWithConnection;
import org.inkgate.architecture.fixtures.analysis.AnalysisWithJavaFxList;
import org.inkgate.architecture.fixtures.format.FormatOpeningScreen;
import org.inkgate.architecture.fixtures.format.FormatReadingRoster;
import org.inkgate.architecture.fixtures.packs.PackOpeningScreen;
import org.inkgate.architecture.fixtures.packs.PackReadingBundle;
import org.inkgate.architecture.fixtures.packs.PackReadingRoster;
import org.inkgate.architecture.fixtures.packs.PackWarningOnStderr;
import org.inkgate.architecture.fixtures.packs.PackWithJavaFxProperty;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

/**
 * The architecture of Inkgate, checked on every build: UI-free cores, a database-free analysis,
 * and dependencies that point one way (resource-packs &lt;- delivery-client &lt;- admin-tool).
 *
 * <p>admin-tool/app sees every module on its test classpath, so the rules live here. Each rule is
 * also run against {@code org.inkgate.architecture.fixtures}, a small tree of deliberately broken
 * classes, to prove it reports what it should and nothing more.
 */
class ArchitectureTest {

    /** Production classes only: test classes, test-jars (format's fixtures) and our fixtures stay out. */
    private static final JavaClasses PRODUCTION = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .withImportOption(ArchitectureTest::isNotInTestJar)
            .importPackages("org.inkgate");

    private static final JavaClasses FIXTURES = new ClassFileImporter()
            .importPackages("org.inkgate.architecture.fixtures");

    private static boolean isNotInTestJar(Location location) {
        return !location.contains("-tests.jar");
    }

    @Nested
    class ProductionCode {

        private final ArchitectureRules rules = ArchitectureRules.production();

        @Test
        void productionImport_onTestClasspath_holdsPacksAndFormatButNoTestCode() {
            // guards every rule below against passing because nothing was imported
            assertTrue(PRODUCTION.containPackage("org.inkgate.packs"), "resource-packs classes imported");
            assertTrue(PRODUCTION.containPackage("org.inkgate.format"), "format classes imported");
            assertFalse(PRODUCTION.containPackage("org.inkgate.architecture"), "no architecture fixtures imported");
            assertTrue(PRODUCTION.stream().noneMatch(c -> c.getSimpleName().endsWith("Test")),
                    "no test classes imported");
        }

        @Test
        void cores_doNotDependOnJavaFx() {
            rules.coresDoNotUseJavaFx().check(PRODUCTION);
        }

        @Test
        void analysis_doesNotDependOnDatabaseFormatOrAdminCore() {
            rules.analysisUsesNoDatabaseFormatOrAdminCore().check(PRODUCTION);
        }

        @Test
        void resourcePacks_doNotDependOnFormatClientOrAdmin() {
            rules.packsDoNotDependUpwards().check(PRODUCTION);
        }

        @Test
        void format_doesNotDependOnClientOrAdmin() {
            rules.formatDoesNotDependOnClientOrAdmin().check(PRODUCTION);
        }

        @Test
        void cores_doNotWriteToStandardOutOrErr() {
            rules.coresDoNotWriteToStandardStreams().check(PRODUCTION);
        }

        @Test
        void admin_reachesStorageOnlyThroughCoreInterfaces() {
            assertTrue(PRODUCTION.containPackage("org.inkgate.admin.core.store.sqlite"), "store implementations imported");
            rules.adminReachesStorageOnlyThroughCoreInterfaces().check(PRODUCTION);
        }
    }

    @Nested
    class RulesCatchViolations {

        private final ArchitectureRules rules = ArchitectureRules.fixtures();

        @Test
        void fixtureImport_holdsOnlyTheFixturePackage() {
            assertTrue(FIXTURES.contain(PackWithJavaFxProperty.class));
            assertTrue(FIXTURES.stream().allMatch(c -> c.getPackageName().startsWith("org.inkgate.architecture.fixtures")));
        }

        @Test
        void coresJavaFxRule_coreClassesUsingJavaFx_areReported() {
            assertEquals(names(PackWithJavaFxProperty.class, AnalysisWithJavaFxList.class),
                    violatingClasses(rules.coresDoNotUseJavaFx()));
        }

        @Test
        void analysisRule_analysisUsingSqlFormatOrAdminCore_isReported() {
            assertEquals(names(AnalysisWithConnection.class, AnalysisReadingBundle.class, AnalysisReadingRoster.class),
                    violatingClasses(rules.analysisUsesNoDatabaseFormatOrAdminCore()));
        }

        @Test
        void packsRule_packsUsingFormatClientOrAdmin_areReported() {
            assertEquals(names(PackReadingBundle.class, PackOpeningScreen.class, PackReadingRoster.class),
                    violatingClasses(rules.packsDoNotDependUpwards()));
        }

        @Test
        void formatRule_formatUsingClientOrAdmin_isReported() {
            assertEquals(names(FormatOpeningScreen.class, FormatReadingRoster.class),
                    violatingClasses(rules.formatDoesNotDependOnClientOrAdmin()));
        }

        @Test
        void standardStreamsRule_coreClassesPrinting_areReported() {
            assertEquals(names(RosterPrinter.class, PackWarningOnStderr.class),
                    violatingClasses(rules.coresDoNotWriteToStandardStreams()));
        }

        @Test
        void storageRule_adminClassesUsingSqlOrSqliteStore_areReported() {
            assertEquals(names(StepOpeningSqliteStore.class, CommandWithConnection.class),
                    violatingClasses(rules.adminReachesStorageOnlyThroughCoreInterfaces()));
        }

        @Test
        void storageRule_storeImplementationAndFactory_areExempt() {
            Set<String> violating = violatingClasses(rules.adminReachesStorageOnlyThroughCoreInterfaces());
            assertFalse(violating.contains(SqliteFixtureStore.class.getName()));
            assertFalse(violating.contains(org.inkgate.architecture.fixtures.admin.core.store.Stores.class.getName()));
        }

        @Test
        void standardStreamsRule_commandLineMainInAppPackage_isExempt() {
            assertFalse(violatingClasses(rules.coresDoNotWriteToStandardStreams())
                    .contains(CommandLineMain.class.getName()));
        }

        @Test
        void rules_noMatchingClasses_refuseToCheckNothing() {
            // no rule allows an empty match any more (the analysis module has classes now): a typo
            // in a rule's package would match nothing, and ArchUnit then fails instead of passing silently
            JavaClasses packsOnly = new ClassFileImporter().importClasses(PackReadingBundle.class);
            for (ArchRule rule : new ArchRule[] {rules.analysisUsesNoDatabaseFormatOrAdminCore(),
                rules.formatDoesNotDependOnClientOrAdmin()}) {
                AssertionError refusal = assertThrows(AssertionError.class, () -> rule.evaluate(packsOnly));
                assertTrue(refusal.getMessage().contains("failed to check any classes"), refusal.getMessage());
            }
        }

        /** The classes that the rule's violations originate in, as fully qualified names. */
        private Set<String> violatingClasses(ArchRule rule) {
            Set<String> origins = new TreeSet<>();
            rule.evaluate(FIXTURES).handleViolations(
                    (Collection<HasSourceCodeLocation> violations, String message) -> violations.forEach(
                            v -> origins.add(v.getSourceCodeLocation().getSourceClass().getName())));
            return origins;
        }

        private static Set<String> names(Class<?>... classes) {
            return new TreeSet<>(Stream.of(classes).map(Class::getName).toList());
        }
    }
}
