package org.inkgate.client.sitting.store;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import org.inkgate.client.processlog.EventRecording;
import org.inkgate.client.processlog.ProcessLog;
import org.inkgate.client.sitting.clock.SittingClock;
import org.inkgate.format.json.Json;
import org.inkgate.format.response.EventType;
import org.inkgate.format.response.ProcessEvent;

/**
 * The process log of a live sitting, kept in the sitting's SQLite database
 * ({@link SittingDatabase}). {@link #record} and {@link #snapshot} stamp the event with both
 * clocks and put it on a queue, never touching the disk; one writer thread numbers events
 * without gaps, writes them and commits in batches: a batch closes {@value #BATCH_MILLIS} ms after
 * its first item, so every event is on disk within about a tenth of a second plus the time of one
 * fsync. Text snapshots are held back per task (newest only) and written when the previous one
 * is {@value #SNAPSHOT_EVERY_MILLIS} ms old or typing has paused for {@value #SNAPSHOT_IDLE_MILLIS}
 * ms, both measured on the sitting clock. If the disk refuses a write, the batch is kept in
 * memory and retried, and {@link #problem()} says so until a write succeeds again.
 */
public final class SqliteProcessLog implements ProcessLog, AutoCloseable {

    /** Suffix of the lock file beside a sitting database while a log writes it. */
    public static final String LOCK_SUFFIX = ".writer-lock";

    /** How long a batch stays open after its first item. */
    public static final long BATCH_MILLIS = 100;
    /** Snapshots of one task are written at most this often while typing goes on. */
    public static final long SNAPSHOT_EVERY_MILLIS = 2_000;
    /** A snapshot is written once no new one has been offered for this long (a typing pause). */
    public static final long SNAPSHOT_IDLE_MILLIS = 1_000;

    private static final long TICK_MILLIS = 100;
    private static final long RETRY_MILLIS = 250;

    private sealed interface Item permits EventItem, SnapshotItem, StateItem, QueryItem, CloseItem {
    }

    private record EventItem(Instant at, long mono, String type, String task, String data) implements Item {
    }

    private record SnapshotItem(String task, String text, int caret, long mono) implements Item {
    }

    private record StateItem(StateChange change) implements Item {
    }

    private record QueryItem(StoreQuery<?> query, CompletableFuture<Object> result) implements Item {
    }

    private record CloseItem(CompletableFuture<Object> done) implements Item {
    }

    /** A snapshot waiting for its turn: it reflects every event up to {@code afterSeq}. */
    private record HeldSnapshot(String text, int caret, long afterSeq, long offeredMono, Instant at) {
    }

    private final Path file;
    private final FileLock writerLock;
    private final Connection connection;
    private final SittingClock clock;
    private final LinkedBlockingQueue<Item> queue = new LinkedBlockingQueue<>();
    private final Object stampLock = new Object();
    private final Thread writer;
    private final Map<String, HeldSnapshot> held = new HashMap<>();
    private final Map<String, Long> lastSnapshotWritten = new HashMap<>();
    private long lastSeq;
    private volatile String problem;
    private volatile boolean closed;

    private SqliteProcessLog(Path file, FileLock writerLock, Connection connection, SittingClock clock, long lastSeq) {
        this.file = file;
        this.writerLock = writerLock;
        this.connection = connection;
        this.clock = clock;
        this.lastSeq = lastSeq;
        this.writer = Thread.ofPlatform().name("inkgate-process-log").daemon(true).unstarted(this::run);
    }

    /**
     * Opens the log of the sitting database {@code file}; numbering continues after its last event.
     * Only one log may write a sitting at a time (in this process or any other): a second open is
     * refused while the first is open, because two writers would number events twice. The lock is
     * a file beside the database ({@value #LOCK_SUFFIX}), released by the operating system if the
     * process dies.
     */
    public static SqliteProcessLog open(Path file, SittingClock clock) throws IOException {
        Objects.requireNonNull(clock, "clock");
        FileLock lock = lockWriter(file);
        Connection c;
        long last;
        try {
            c = SittingDatabase.open(file);
            try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("SELECT COALESCE(MAX(seq), 0) FROM events")) {
                last = rs.getLong(1);
            } catch (SQLException e) {
                closeQuietly(c);
                throw new IOException(file + ": cannot read the process log: " + e.getMessage(), e);
            }
        } catch (IOException | RuntimeException e) {
            release(lock);
            throw e;
        }
        SqliteProcessLog log = new SqliteProcessLog(file, lock, c, clock, last);
        log.writer.start();
        return log;
    }

    /** The database file. */
    public Path file() {
        return file;
    }

    /** The sitting clock events are stamped with. */
    public SittingClock clock() {
        return clock;
    }

    @Override
    public void record(EventType type, String taskId, Map<String, Object> data) {
        Objects.requireNonNull(type, "type");
        Map<String, Object> fields = data == null ? Map.of() : data;
        for (Map.Entry<String, Object> e : fields.entrySet()) {
            Object v = e.getValue();
            if (!(v instanceof String || v instanceof Number || v instanceof Boolean)) {
                throw new IllegalArgumentException("event " + type.wireName() + " field \"" + e.getKey()
                        + "\" must be a string, number or boolean, not " + (v == null ? "null" : v.getClass().getSimpleName()));
            }
        }
        // a writer that drifts from the vocabulary's keys fails every test that reaches it (tests run with -ea);
        // in a live sitting the event is still kept, and the collector names it
        assert EventRecording.keepsContract(type, taskId, fields);
        String json = new String(Json.writeLine(new java.util.TreeMap<>(fields)), StandardCharsets.UTF_8);
        requireOpen();
        // stamping and queueing under one lock keeps queue order equal to clock order across threads
        synchronized (stampLock) {
            queue.add(new EventItem(clock.now(), clock.monoNanos(), type.wireName(), taskId, json));
        }
    }

    @Override
    public void snapshot(String taskId, String text, int caret) {
        Objects.requireNonNull(taskId, "taskId");
        Objects.requireNonNull(text, "text");
        requireOpen();
        synchronized (stampLock) {
            queue.add(new SnapshotItem(taskId, text, caret, clock.monoNanos()));
        }
    }

    /**
     * Queues a change of the sitting's durable state, committed in order with the events before it.
     * Package-private: the raw connection stays in the store package ({@link SittingStateStore}).
     */
    void persist(StateChange change) {
        requireOpen();
        queue.add(new StateItem(Objects.requireNonNull(change, "change")));
    }

    /**
     * Waits until everything queued so far is committed and then runs {@code query} on the
     * writer's connection. Blocks: not for the UI thread while typing. Package-private, as {@link #persist}.
     */
    @SuppressWarnings("unchecked")
    <T> T read(StoreQuery<T> query) throws IOException {
        requireOpen();
        CompletableFuture<Object> result = new CompletableFuture<>();
        queue.add(new QueryItem(query, result));
        return (T) await(result);
    }

    /** Waits until everything queued so far is committed (held snapshots may still wait their turn). */
    public void flush() throws IOException {
        read(c -> null);
    }

    /** All events committed so far, in order, as the response package will carry them. */
    public List<ProcessEvent> events() throws IOException {
        return read(SqliteProcessLog::readEvents);
    }

    /** The events of one task after {@code afterSeq}, in order. */
    public List<ProcessEvent> events(String taskId, long afterSeq) throws IOException {
        return read(c -> readTaskEvents(c, taskId, afterSeq));
    }

    /** Why the last write failed, while writes are failing; empty when the log is healthy. */
    public Optional<String> problem() {
        return Optional.ofNullable(problem);
    }

    /** Writes everything queued and every held snapshot, then closes the database. */
    @Override
    public void close() throws IOException {
        if (closed) {
            return;
        }
        CompletableFuture<Object> done = new CompletableFuture<>();
        queue.add(new CloseItem(done));
        closed = true;
        try {
            await(done);
        } finally {
            try {
                writer.join(10_000);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }
    }

    private static FileLock lockWriter(Path file) throws IOException {
        Path lockFile = file.resolveSibling(file.getFileName() + LOCK_SUFFIX);
        java.nio.file.Files.createDirectories(lockFile.toAbsolutePath().getParent());
        FileChannel channel = FileChannel.open(lockFile, StandardOpenOption.CREATE, StandardOpenOption.WRITE);
        FileLock lock;
        try {
            lock = channel.tryLock();
        } catch (OverlappingFileLockException e) {
            lock = null;
        }
        if (lock == null) {
            channel.close();
            throw new IOException(file + ": this sitting is already open in a running client (or a second time in this"
                    + " one); only one may write it at a time. Close the other client, or wait for the first resume to finish.");
        }
        return lock;
    }

    private static void release(FileLock lock) {
        try {
            lock.release();
            lock.channel().close();
        } catch (IOException e) {
            // the operating system drops the lock with the process anyway
        }
    }

    // -- reading (also for the state store's reads) --

    /** Reads every event of an open connection, in order. */
    static List<ProcessEvent> readEvents(Connection c) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT seq, at, mono, type, task, data FROM events ORDER BY seq")) {
            return toEvents(ps);
        }
    }

    /** Reads the events of one task after {@code afterSeq}, in order. */
    static List<ProcessEvent> readTaskEvents(Connection c, String taskId, long afterSeq) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement(
                "SELECT seq, at, mono, type, task, data FROM events WHERE task = ? AND seq > ? ORDER BY seq")) {
            ps.setString(1, taskId);
            ps.setLong(2, afterSeq);
            return toEvents(ps);
        }
    }

    @SuppressWarnings("unchecked")
    private static List<ProcessEvent> toEvents(PreparedStatement ps) throws SQLException {
        List<ProcessEvent> events = new ArrayList<>();
        try (ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                Map<String, Object> data;
                try {
                    data = Json.mapper().readValue(rs.getString(6), Map.class);
                } catch (IOException e) {
                    throw new SQLException("event " + rs.getLong(1) + " has unreadable data: " + e.getMessage(), e);
                }
                events.add(new ProcessEvent(rs.getLong(1), Instant.parse(rs.getString(2)), rs.getLong(3), rs.getString(4),
                        rs.getString(5), data));
            }
        }
        return events;
    }

    // -- the writer thread --

    private void run() {
        List<Item> retry = new ArrayList<>();
        while (true) {
            List<Item> batch = new ArrayList<>(retry);
            retry.clear();
            try {
                if (batch.isEmpty()) {
                    Item first = queue.poll(TICK_MILLIS, TimeUnit.MILLISECONDS);
                    if (first != null) {
                        batch.add(first);
                        long until = System.nanoTime() + TimeUnit.MILLISECONDS.toNanos(BATCH_MILLIS);
                        while (!endsBatch(batch.getLast())) {
                            long left = until - System.nanoTime();
                            Item next = left > 0 ? queue.poll(left, TimeUnit.NANOSECONDS) : queue.poll();
                            if (next == null) {
                                break;
                            }
                            batch.add(next);
                        }
                    }
                }
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            boolean closing = batch.stream().anyMatch(CloseItem.class::isInstance);
            try {
                apply(batch, closing);
                problem = null;
            } catch (SQLException | RuntimeException e) {
                rollbackQuietly();
                problem = "the process log could not be written to " + file + " (" + e.getMessage()
                        + "); events are kept in memory and the write is retried";
                retry.addAll(batch);
                sleepQuietly(RETRY_MILLIS);
                continue;
            }
            if (closing) {
                try {
                    closeQuietly(connection);
                } finally {
                    release(writerLock);
                }
                return;
            }
        }
    }

    private static boolean endsBatch(Item item) {
        return item instanceof QueryItem || item instanceof CloseItem;
    }

    /** Applies a batch in one transaction; queries and close run once what precedes them is committed. */
    private void apply(List<Item> batch, boolean closing) throws SQLException {
        long seq = lastSeq;
        Map<String, HeldSnapshot> heldNow = new HashMap<>(held);
        List<Runnable> afterCommit = new ArrayList<>();
        try (PreparedStatement insert = connection.prepareStatement(
                "INSERT INTO events(seq, at, mono, type, task, data) VALUES (?, ?, ?, ?, ?, ?)")) {
            for (Item item : batch) {
                switch (item) {
                    case EventItem e -> {
                        seq++;
                        insert.setLong(1, seq);
                        insert.setString(2, e.at().toString());
                        insert.setLong(3, e.mono());
                        insert.setString(4, e.type());
                        insert.setString(5, e.task());
                        insert.setString(6, e.data());
                        insert.executeUpdate();
                    }
                    case SnapshotItem s -> heldNow.put(s.task(), new HeldSnapshot(s.text(), s.caret(), seq, s.mono(), clock.now()));
                    case StateItem s -> s.change().apply(connection);
                    case QueryItem q -> afterCommit.add(() -> runQuery(q));
                    case CloseItem c -> afterCommit.add(() -> c.done().complete(null));
                }
            }
        }
        long now = clock.monoNanos();
        Map<String, Long> written = writeDueSnapshots(heldNow, now, closing);
        connection.commit();
        lastSeq = seq;
        held.clear();
        held.putAll(heldNow);
        written.keySet().forEach(held::remove);
        lastSnapshotWritten.putAll(written);
        afterCommit.forEach(Runnable::run);
    }

    private Map<String, Long> writeDueSnapshots(Map<String, HeldSnapshot> heldNow, long now, boolean all) throws SQLException {
        Map<String, Long> written = new HashMap<>();
        if (heldNow.isEmpty()) {
            return written;
        }
        try (PreparedStatement ps = connection.prepareStatement(
                "INSERT OR REPLACE INTO snapshots(task, text, caret, after_seq, at) VALUES (?, ?, ?, ?, ?)")) {
            for (Map.Entry<String, HeldSnapshot> e : heldNow.entrySet()) {
                HeldSnapshot s = e.getValue();
                Long last = lastSnapshotWritten.get(e.getKey());
                boolean due = all || last == null
                        || now - last >= TimeUnit.MILLISECONDS.toNanos(SNAPSHOT_EVERY_MILLIS)
                        || now - s.offeredMono() >= TimeUnit.MILLISECONDS.toNanos(SNAPSHOT_IDLE_MILLIS);
                if (due) {
                    ps.setString(1, e.getKey());
                    ps.setString(2, s.text());
                    ps.setInt(3, s.caret());
                    ps.setLong(4, s.afterSeq());
                    ps.setString(5, s.at().toString());
                    ps.executeUpdate();
                    written.put(e.getKey(), now);
                }
            }
        }
        return written;
    }

    private void runQuery(QueryItem q) {
        try {
            q.result().complete(q.query().run(connection));
        } catch (SQLException | RuntimeException e) {
            q.result().completeExceptionally(e);
        }
    }

    private static Object await(CompletableFuture<Object> future) throws IOException {
        try {
            return future.get(30, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("interrupted while waiting for the process log", e);
        } catch (ExecutionException e) {
            throw new IOException("the process log could not be read: " + e.getCause().getMessage(), e.getCause());
        } catch (TimeoutException e) {
            throw new IOException("the process log did not answer within 30 s: its disk may be failing", e);
        }
    }

    private void requireOpen() {
        if (closed) {
            throw new IllegalStateException("the process log of " + file + " is closed");
        }
    }

    private void rollbackQuietly() {
        try {
            connection.rollback();
        } catch (SQLException ignored) {
            // the retry reports the state of the database
        }
    }

    private static void sleepQuietly(long millis) {
        try {
            Thread.sleep(millis);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    private static void closeQuietly(Connection c) {
        try {
            c.close();
        } catch (SQLException e) {
            throw new UncheckedIOException(new IOException("closing the sitting database failed: " + e.getMessage(), e));
        }
    }
}
