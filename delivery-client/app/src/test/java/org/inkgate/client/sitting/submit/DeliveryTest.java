package org.inkgate.client.sitting.submit;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.inkgate.client.sitting.Sitting;
import org.inkgate.client.sitting.store.ClientDataFolder;
import org.inkgate.client.testutil.FakeClock;
import org.inkgate.client.testutil.SittingFixtures;
import org.inkgate.format.response.EventType;
import org.inkgate.format.response.ResponsePackageReader;
import org.inkgate.format.response.TaskResponse.EndReason;
import org.inkgate.format.testutil.TestKeys;
import org.inkgate.format.trust.TrustPolicy;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * An output folder that is missing, read-only or full ends in a typed failure, with the package
 * safe in the client data folder and deliverable by a retry. "Full" and "read-only" are tested
 * twice: with a faked file system (always), and with a real 64 KiB tmpfs mounted for the test
 * (only where the test may mount one, i.e. as root with mount available; skipped otherwise).
 */
class DeliveryTest {

    @TempDir
    Path dir;

    @Test
    void submit_outputFolderMissing_failsClearlyKeepsTheLocalCopyAndRetryDelivers() throws Exception {
        try (Sitting s = finishedSitting()) {
            Path missing = dir.resolve("stick-not-plugged-in");
            SubmissionResult first = s.submit(missing, key());
            DeliveryFailure f = first.failure().orElseThrow();
            assertInstanceOf(DeliveryFailure.FolderMissing.class, f);
            assertTrue(f.message().contains("saved on this computer"), f.message());
            assertFalse(Files.exists(missing), "a missing output folder is never created on the local disk");
            assertOpens(first.localCopy());
            Path good = Files.createDirectories(dir.resolve("usb"));
            SubmissionResult retry = s.retryDelivery(good);
            assertTrue(retry.complete());
            assertEquals(first.packageId(), retry.packageId(), "a re-sent copy keeps its package id (docs/formats.md)");
            assertArrayEquals(Files.readAllBytes(first.localCopy()), Files.readAllBytes(retry.delivered().orElseThrow()));
        }
    }

    @Test
    void submit_outputFolderFull_fakedStore_failsAsFullBeforeWriting() throws Exception {
        try (Sitting s = finishedSitting()) {
            Path out = Files.createDirectories(dir.resolve("out"));
            s.useDelivery(new PackageDelivery(new Faked(100, null)));
            SubmissionResult r = s.submit(out, key());
            DeliveryFailure.FolderFull full = assertInstanceOf(DeliveryFailure.FolderFull.class, r.failure().orElseThrow());
            assertEquals(100, full.available());
            assertTrue(full.needed() > 100);
            assertOpens(r.localCopy());
        }
    }

    @Test
    void submit_writeFailsWithNoSpace_fakedStore_failsAsFull() throws Exception {
        try (Sitting s = finishedSitting()) {
            Path out = Files.createDirectories(dir.resolve("out"));
            s.useDelivery(new PackageDelivery(new Faked(-1, new FileSystemException(out + "/x", null, "No space left on device"))));
            assertInstanceOf(DeliveryFailure.FolderFull.class, s.submit(out, key()).failure().orElseThrow());
        }
    }

    @Test
    void submit_outputFolderReadOnly_fakedStore_failsAsReadOnly() throws Exception {
        try (Sitting s = finishedSitting()) {
            Path out = Files.createDirectories(dir.resolve("out"));
            s.useDelivery(new PackageDelivery(new Faked(-1, new AccessDeniedException(out + "/x"))));
            SubmissionResult r = s.submit(out, key());
            assertInstanceOf(DeliveryFailure.FolderReadOnly.class, r.failure().orElseThrow());
            assertOpens(r.localCopy());
        }
    }

    @Test
    void submit_realTinyTmpfs_fullAndThenReadOnly_failTypedAndNothingIsLost() throws Exception {
        Path mount = Files.createDirectories(dir.resolve("tmpfs"));
        assumeTrue(run("mount", "-t", "tmpfs", "-o", "size=64k", "inkgate-test", mount.toString()),
                "needs permission to mount a tmpfs (root); the faked-store tests cover the same paths");
        try {
            // fill the 64 KiB store so that not even a small package fits
            try {
                Files.write(mount.resolve("filler"), new byte[64 * 1024]);
            } catch (IOException expected) {
                // the store is full now
            }
            try (Sitting s = finishedSitting()) {
                SubmissionResult r = s.submit(mount, key());
                assertInstanceOf(DeliveryFailure.FolderFull.class, r.failure().orElseThrow(), r.toString());
                assertOpens(r.localCopy());
                Files.delete(mount.resolve("filler"));
                assertTrue(run("mount", "-o", "remount,ro", mount.toString()));
                SubmissionResult ro = s.retryDelivery(mount);
                assertInstanceOf(DeliveryFailure.FolderReadOnly.class, ro.failure().orElseThrow(), ro.toString());
                assertTrue(run("mount", "-o", "remount,rw", mount.toString()));
                assertTrue(s.retryDelivery(mount).complete());
            }
        } finally {
            run("umount", mount.toString());
        }
    }

    private Sitting finishedSitting() throws Exception {
        ClientDataFolder folder = new ClientDataFolder(dir.resolve("data"));
        Sitting s = Sitting.begin(SittingFixtures.candidate1001(), folder, new FakeClock());
        s.enterTask("t1");
        s.log().record(EventType.TEXT_INSERT, "t1", Map.of("pos", 0, "len", 5, "text", "Hello", "source", "typing"));
        s.endTask("t1", EndReason.SUBMITTED, "Hello", 1, Map.of());
        s.endUnstartedTasks(EndReason.ENDED_BY_INVIGILATOR);
        return s;
    }

    private InstallationKey key() throws IOException {
        return InstallationKey.loadOrCreate(new ClientDataFolder(dir.resolve("data")));
    }

    private void assertOpens(Path local) throws Exception {
        var opened = new ResponsePackageReader(TestKeys.OWNER_ENCRYPTION, TrustPolicy.trusting(java.util.Set.of(key().fingerprint())))
                .open(local);
        assertEquals("Hello", opened.response().tasks().getFirst().text());
    }

    private static boolean run(String... command) {
        try {
            Process p = new ProcessBuilder(command).redirectErrorStream(true).start();
            p.getInputStream().readAllBytes();
            return p.waitFor(30, TimeUnit.SECONDS) && p.exitValue() == 0;
        } catch (IOException e) {
            return false;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return false;
        }
    }

    /** A file system whose store reports {@code free} bytes and whose writes throw {@code failure}. */
    private record Faked(long free, IOException failure) implements FolderAccess {
        @Override
        public boolean isFolder(Path folder) {
            return true;
        }

        @Override
        public long usableSpace(Path folder) {
            return free;
        }

        @Override
        public void writeAtomically(Path target, byte[] bytes) throws IOException {
            if (failure != null) {
                throw failure;
            }
            throw new AssertionError("the faked store should not be written to");
        }
    }
}
