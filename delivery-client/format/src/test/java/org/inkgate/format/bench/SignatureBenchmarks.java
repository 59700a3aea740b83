package org.inkgate.format.bench;

import java.security.KeyPair;
import java.security.Signature;
import java.util.concurrent.TimeUnit;
import javax.crypto.KeyAgreement;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.X25519;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.inkgate.format.crypto.Hex;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * What opening a response package pays once per package for its signature and its key agreement: the
 * JDK's providers (what the reader used before) against Bouncy Castle's RFC 8032 and RFC 7748 code
 * (what {@link Ed25519#verify} and {@link X25519#agree} use now; issue 16, docs/benchmarks.md). The
 * message is the size of a package manifest.
 *
 * <p>Run alone: {@code java -cp <format test class path> org.openjdk.jmh.Main SignatureBenchmarks}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class SignatureBenchmarks {

    private KeyPair signing;
    private byte[] rawSigningPublic;
    private byte[] message;
    private byte[] signature;
    private KeyPair own;
    private KeyPair peer;
    private byte[] ownScalar;
    private byte[] peerU;

    @Setup
    public void setUp() {
        signing = Ed25519.generate();
        rawSigningPublic = Ed25519.rawPublic(signing.getPublic());
        message = new byte[2_000];
        new java.util.SplittableRandom(16).nextBytes(message);
        signature = Ed25519.sign(signing.getPrivate(), message);
        own = X25519.generate();
        peer = X25519.generate();
        ownScalar = X25519.rawPrivate(own.getPrivate());
        peerU = X25519.rawPublic(peer.getPublic());
        if (!Hex.of(jdkAgree()).equals(Hex.of(agree())) || !jdkVerify() || !verify()) {
            throw new IllegalStateException("the two implementations disagree");
        }
    }

    @Benchmark
    public boolean jdkVerify() {
        try {
            Signature s = Signature.getInstance("Ed25519");
            s.initVerify(signing.getPublic());
            s.update(message);
            return s.verify(signature);
        } catch (java.security.GeneralSecurityException e) {
            throw new IllegalStateException(e);
        }
    }

    @Benchmark
    public boolean verify() {
        return Ed25519.verify(rawSigningPublic, message, signature);
    }

    @Benchmark
    public byte[] jdkAgree() {
        try {
            KeyAgreement k = KeyAgreement.getInstance("X25519");
            k.init(own.getPrivate());
            k.doPhase(peer.getPublic(), true);
            return k.generateSecret();
        } catch (java.security.GeneralSecurityException e) {
            throw new IllegalStateException(e);
        }
    }

    @Benchmark
    public byte[] agree() {
        return X25519.agree(ownScalar, peerU);
    }
}
