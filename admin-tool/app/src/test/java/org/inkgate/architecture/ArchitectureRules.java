package org.inkgate.architecture;

import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAPackage;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.simpleNameStartingWith;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.lang.ArchRule;
import com.tngtech.archunit.library.GeneralCodingRules;
import java.util.Objects;

/**
 * The layering rules of Inkgate, stated once for a package root.
 *
 * <p>The production code lives under {@code org.inkgate}; the test fixtures that prove each rule
 * can fail mirror the same layout under {@code org.inkgate.architecture.fixtures}. Building both
 * from one factory means the rule a fixture breaks is the very rule the production code keeps.
 *
 * @param root the package that holds {@code packs}, {@code format}, {@code client},
 *     {@code admin.core} and {@code analysis}
 */
record ArchitectureRules(String root) {

    ArchitectureRules {
        Objects.requireNonNull(root, "root");
    }

    /** The Inkgate code itself. */
    static ArchitectureRules production() {
        return new ArchitectureRules("org.inkgate");
    }

    /** The deliberately broken fixtures, laid out like production under their own root. */
    static ArchitectureRules fixtures() {
        return new ArchitectureRules("org.inkgate.architecture.fixtures");
    }

    String packs() {
        return root + ".packs..";
    }

    String format() {
        return root + ".format..";
    }

    String client() {
        return root + ".client..";
    }

    String admin() {
        return root + ".admin..";
    }

    String adminCore() {
        return root + ".admin.core..";
    }

    String analysis() {
        return root + ".analysis..";
    }

    /**
     * The admin core's store implementations: the shared transaction layer ({@code store.sql}) and
     * each kind of store ({@code store.sqlite}, {@code store.postgresql}). Only they see SQL.
     */
    String[] storeImplementations() {
        return new String[] {root + ".admin.core.store.sql..", root + ".admin.core.store.sqlite..",
            root + ".admin.core.store.postgresql.."};
    }

    /** The one factory that opens stores from a location, and so names each implementation. */
    String storeFactory() {
        return root + ".admin.core.store.Stores";
    }

    /** The UI-free cores: resource packs, the file formats, the admin core and the analysis. */
    String[] cores() {
        return new String[] {packs(), format(), adminCore(), analysis()};
    }

    /** (a) Cores never see JavaFX; only the client and admin apps draw screens. */
    ArchRule coresDoNotUseJavaFx() {
        return noClasses().that().resideInAnyPackage(cores())
                .should().dependOnClassesThat().resideInAPackage("javafx..")
                .because("the cores are UI-free so that the GUI and the command line call the same services");
    }

    /** (b) Analysis is pure functions over plain data: no database, no bundle format, no admin core. */
    ArchRule analysisUsesNoDatabaseFormatOrAdminCore() {
        return noClasses().that().resideInAPackage(analysis())
                .should().dependOnClassesThat().resideInAnyPackage("java.sql..", format(), adminCore())
                .because("analysis takes plain data and returns plain results, so it can be tested and cited alone");
    }

    /** (c) Resource packs are the bottom layer: they know nothing of formats, client or admin. */
    ArchRule packsDoNotDependUpwards() {
        return noClasses().that().resideInAPackage(packs())
                .should().dependOnClassesThat().resideInAnyPackage(format(), client(), admin())
                .because("dependencies point one way: resource-packs <- delivery-client <- admin-tool");
    }

    /** (d) The file formats serve both client and admin tool, so they depend on neither. */
    ArchRule formatDoesNotDependOnClientOrAdmin() {
        return noClasses().that().resideInAPackage(format())
                .should().dependOnClassesThat().resideInAnyPackage(client(), admin())
                .because("the admin tool and the client both read and write these files");
    }

    /**
     * (e) Cores report through return values and exceptions, never by printing.
     *
     * <p>This is {@link GeneralCodingRules#NO_CLASSES_SHOULD_ACCESS_STANDARD_STREAMS} (which is
     * {@code noClasses().should(ACCESS_STANDARD_STREAMS)}) scoped to the cores: command-line main
     * classes in the app packages print by design and stay outside the scope.
     */
    ArchRule coresDoNotWriteToStandardStreams() {
        return noClasses().that().resideInAnyPackage(cores())
                .should(GeneralCodingRules.ACCESS_STANDARD_STREAMS)
                .because("only the command line in the app packages talks to the terminal");
    }

    /**
     * (f) The admin tool reaches storage only through the core's store interfaces, opened by
     * {@code store.Stores} from a store location: no JDBC and no SQLite class outside the store
     * implementations and their factory, so a second kind of store changes nothing above them. (The delivery
     * client's own per-sitting database is outside this rule.)
     */
    ArchRule adminReachesStorageOnlyThroughCoreInterfaces() {
        return noClasses().that().resideInAPackage(admin()).and().resideOutsideOfPackages(storeImplementations())
                .and().doNotHaveFullyQualifiedName(storeFactory())
                .should().dependOnClassesThat(resideInAPackage("java.sql..").or(resideInAPackage("org.sqlite.."))
                        .or(resideInAPackage("org.postgresql..")).or(simpleNameStartingWith("Sqlite"))
                        .or(simpleNameStartingWith("Postgres")))
                .because("the command line and the admin window open stores through store.Stores and use the core"
                        + " interfaces it returns, never SQL or a store implementation");
    }
}
