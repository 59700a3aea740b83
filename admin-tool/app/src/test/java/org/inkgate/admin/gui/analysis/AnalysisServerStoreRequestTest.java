package org.inkgate.admin.gui.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Collections;
import java.util.List;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.gui.AdminSession;
import org.inkgate.admin.study.AnalysisRun;
import org.junit.jupiter.api.Test;

/**
 * Issue 19: the analysis step on a PostgreSQL store asks {@link AnalysisRun} for the store the
 * command's {@code --store} and {@code --store-password-file} name, and records those two options
 * in the report's command line (the password file by its path; the window never holds a password).
 * The address and paths are invented.
 */
class AnalysisServerStoreRequestTest {

    private static final String ADDRESS = "postgresql://owner@db.invented.example:5433/inkgate?sslmode=verify-full";

    @Test
    void request_serverAddressAndPasswordFile_isTheCommandsStoreWithBothOptionsInTheArguments() throws Exception {
        AdminSession session = new AdminSession();
        AnalysisModel model = new AnalysisModel(session);
        model.store().set(ADDRESS);
        session.storePasswordFile().set("/invented/store.pgpass");
        model.out().set("/invented/report");

        AnalysisRun.Request request = model.request();

        assertEquals(StoreLocation.parse(ADDRESS), ((StoreLocation.Server) request.store()).withPasswordFile(null));
        assertEquals(Path.of("/invented/store.pgpass"), ((StoreLocation.Server) request.store()).passwordFile());
        List<String> args = request.arguments();
        assertTrue(Collections.indexOfSubList(args, List.of("--store", ADDRESS, "--store-password-file",
                "/invented/store.pgpass")) >= 0, "the command's options: " + args);
        assertTrue(request.inputFiles().isEmpty(), "a server store is no input file with a digest: " + args);
    }

    @Test
    void request_serverAddressWithoutPasswordFile_leavesTheEnvironmentToGiveThePassword() throws Exception {
        AdminSession session = new AdminSession();
        AnalysisModel model = new AnalysisModel(session);
        model.store().set(ADDRESS);
        model.out().set("/invented/report");

        AnalysisRun.Request request = model.request();

        assertEquals(null, ((StoreLocation.Server) request.store()).passwordFile());
        assertTrue(!request.arguments().contains("--store-password-file"), request.arguments().toString());
    }
}
