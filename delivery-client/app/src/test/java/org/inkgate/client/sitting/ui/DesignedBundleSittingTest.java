package org.inkgate.client.sitting.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import javafx.scene.Node;
import javafx.stage.Stage;
import org.inkgate.client.demo.DemoBundleBuild;
import org.inkgate.client.demo.DemoSittingBuild;
import org.inkgate.client.practice.PracticeLoad;
import org.inkgate.client.practice.PracticeLoader;
import org.inkgate.client.sitting.clock.SittingClock;
import org.inkgate.client.testutil.DemoBundles;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.bundle.StudyDesign;
import org.inkgate.format.crypto.Hex;
import org.inkgate.format.crypto.X25519;
import org.inkgate.format.json.Json;
import org.inkgate.format.response.OpenedResponse;
import org.inkgate.format.response.ResponsePackageReader;
import org.inkgate.format.response.TaskResponse;
import org.inkgate.format.trust.TrustPolicy;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * A bundle that declares its study design (schema version 2, docs/formats.md) opens in this
 * client and is sat to the end: the client does not use the design, but must not refuse it. The
 * bundle is the demo source with {@code "design": "crossover"} added (its forms A and B are the
 * two orders of a two-condition crossover, src/demo/exam.json), built by the real build steps.
 */
@ExtendWith(ApplicationExtension.class)
class DesignedBundleSittingTest {

    @TempDir
    Path temp;
    private Stage stage;

    @Start
    void start(Stage primary) {
        this.stage = primary;
    }

    /** A copy of the demo source declaring a crossover design, in the schema version that holds it. */
    private Path demoSourceDeclaringCrossover() throws Exception {
        Path source = DemoBundles.copySource(temp);
        Path exam = source.resolve("exam.json");
        ObjectNode tree = (ObjectNode) Json.mapper().readTree(Files.readAllBytes(exam));
        tree.put("schemaVersion", 2).put("design", StudyDesign.CROSSOVER.word());
        Files.write(exam, Json.write(tree));
        return source;
    }

    @Test
    void fullSitting_bundleDeclaringACrossoverDesign_opensAndHandsInAPackage(FxRobot robot) throws Exception {
        Path bundle = temp.resolve("designed-sitting.inkexam");
        DemoSittingBuild.build(demoSourceDeclaringCrossover(), bundle);
        JsonNode written;
        try (java.util.zip.ZipFile zip = new java.util.zip.ZipFile(bundle.toFile())) {
            written = Json.mapper().readTree(zip.getInputStream(zip.getEntry("manifest.json")).readAllBytes());
        }
        assertEquals(2, written.path("schemaVersion").asInt());
        assertEquals("crossover", written.path("design").asText());
        String manifestSha;
        try (OpenedBundle opened = FlowDriver.demoReader().open(bundle)) {
            assertEquals(StudyDesign.CROSSOVER, opened.manifest().design());
            manifestSha = opened.manifestSha256();
        }

        FlowDriver d = new FlowDriver(new FxRobot(), stage, temp.resolve("data"));
        Path out = temp.resolve("out");
        d.open(bundle, SittingClock.system(), false);
        d.setUp(FlowDriver.demoPin(), out);
        // D1001 sits form A (src/demo/sitting.json): neighbour-note, then mill-street-shop (exam.json)
        d.signIn("D1001");
        d.press("startButton");
        d.awaitTask("A note to a neighbour");
        d.typeInEditor("Dear Sam, thank you.");
        d.finishTask();
        d.awaitTask("The empty shop on Mill Street");
        d.typeInEditor("The shop could be a cafe.");
        d.finishTask();
        d.press("q-clear-instructions-4");
        d.press("questionnaireDone");
        d.await("submitButton", Node.class);
        d.check("confirmCheck");
        d.press("submitButton");
        d.await("finishedScreen", Node.class);

        Path[] packages;
        try (Stream<Path> files = Files.list(out)) {
            packages = files.filter(p -> p.toString().endsWith(".inkresp")).toArray(Path[]::new);
        }
        assertEquals(1, packages.length);
        OpenedResponse response = new ResponsePackageReader(X25519.privateFromRaw(Hex.parse(Files.readString(
                DemoBundles.SOURCE.resolve("keys/demo-only-not-secret-owner-encryption.x25519.hex")).strip())),
                TrustPolicy.anySigner())
                .open(packages[0]);
        assertEquals(manifestSha, response.response().bundleManifestSha256());
        assertEquals(List.of("with-resources", "without-resources"),
                response.response().tasks().stream().map(TaskResponse::conditionId).toList());
    }

    @Test
    void practice_bundleDeclaringACrossoverDesign_opensWithBothForms() throws Exception {
        Path bundle = temp.resolve("designed-practice.inkexam");
        DemoBundleBuild.build(demoSourceDeclaringCrossover(), bundle);

        PracticeLoad load = new PracticeLoader().load(bundle);
        assertEquals(2, assertInstanceOf(PracticeLoad.Opened.class, load).exam().forms().size());
    }
}
