package org.telltale.connect;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.LinkedBlockingDeque;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import org.telltale.model.ClassifierException;

/**
 * Scores through long-lived model subprocesses ({@code exec:COMMAND ARGS…}) that speak the native
 * protocol one JSON object per line: a request line on stdin, one answer line on stdout. Up to
 * {@code parallel} processes run, each serving one batch at a time.
 *
 * <p>A process that exits or does not answer within the timeout is killed and replaced on the next
 * attempt (a retryable failure), at most {@code maxRestarts} times over the connector's life. A
 * line that is not a valid answer is a final error, since the stream can no longer be trusted;
 * every error carries the tail of the process's stderr.
 */
final class SubprocessScorer implements BatchScorer {
    private final List<String> command;
    private final String name;
    private final Duration timeout;
    private final int maxProcesses;
    private final int maxRestarts;
    private final LinkedBlockingDeque<ModelProcess> idle = new LinkedBlockingDeque<>();
    private final List<ModelProcess> all = new ArrayList<>();
    private final AtomicInteger failures = new AtomicInteger();
    private final AtomicInteger restarts = new AtomicInteger();
    private volatile boolean closed;
    private volatile String lastProblem = "";

    SubprocessScorer(List<String> command, String name, Duration timeout, int maxProcesses, int maxRestarts) {
        this.command = List.copyOf(command);
        this.name = name;
        this.timeout = timeout;
        this.maxProcesses = maxProcesses;
        this.maxRestarts = maxRestarts;
    }

    @Override
    public RawScores score(List<String> texts) {
        return prepare(texts).send().decode();
    }

    /** Encodes the request line now; the exchange borrows a process. */
    @Override
    public Exchange prepare(List<String> texts) {
        byte[] line = NativeCodec.request(texts);
        return () -> exchange(line);
    }

    private Reply exchange(byte[] request) {
        ModelProcess p = borrow();
        boolean keep = false;
        // The first answer of a new process includes its start-up: no measure of the model's load.
        boolean warm = p.exchanges() > 0;
        try {
            ModelProcess.Answer answer = p.exchange(request, timeout);
            if (answer instanceof ModelProcess.Line line) {
                RawScores raw;
                try {
                    raw = NativeCodec.parse(line.text().getBytes(StandardCharsets.UTF_8));
                } catch (MalformedResponse bad) {
                    p.kill();
                    throw new MalformedResponse("the subprocess " + name + " wrote a line that is not an answer: "
                            + bad.getMessage() + p.stderrTail());
                }
                keep = true;
                return Reply.of(raw, warm);
            }
            p.kill();
            lastProblem = "; the last failure: " + describe(answer) + p.stderrTail();
            if (answer instanceof ModelProcess.Exited exited) {
                throw new TransientFailure("the subprocess " + name + " exited"
                        + (exited.code() >= 0 ? " with code " + exited.code() : "") + p.stderrTail());
            }
            if (answer instanceof ModelProcess.TooLong) {
                throw new MalformedResponse("the subprocess " + name + " wrote a line longer than "
                        + ModelProcess.MAX_LINE_CHARS + " characters" + p.stderrTail());
            }
            throw new TransientFailure("the subprocess " + name + " did not answer within "
                    + Durations.format(timeout) + " and was killed" + p.stderrTail(), null, null,
                    TransientFailure.Overload.TIMED_OUT);
        } catch (InterruptedException e) {
            p.kill();
            Thread.currentThread().interrupt();
            throw new CancellationException("interrupted");
        } finally {
            giveBack(p, keep);
        }
    }

    private ModelProcess borrow() {
        try {
            while (true) {
                ModelProcess p = idle.pollFirst();
                if (p != null && p.isAlive()) {
                    return p;
                }
                synchronized (this) {
                    if (p != null) {
                        all.remove(p);
                        failures.incrementAndGet();
                    }
                    if (closed) {
                        throw new ClassifierException("the connector to " + name + " is closed");
                    }
                    if (live() < maxProcesses) {
                        return launch();
                    }
                }
                p = idle.pollFirst(50, TimeUnit.MILLISECONDS);
                if (p != null) {
                    if (p.isAlive()) {
                        return p;
                    }
                    idle.addLast(p); // dead: the next round removes and replaces it
                }
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new CancellationException("interrupted");
        }
    }

    private int live() {
        all.removeIf(p -> !p.isAlive());
        return all.size();
    }

    private ModelProcess launch() {
        if (failures.get() > restarts.get() && restarts.incrementAndGet() > maxRestarts) {
            throw new ClassifierException("the subprocess " + name + " failed too often: restarted "
                    + maxRestarts + " times, which is the limit" + lastProblem);
        }
        try {
            ModelProcess p = ModelProcess.start(command, name);
            all.add(p);
            return p;
        } catch (IOException e) {
            throw new ClassifierException("cannot start the subprocess " + name + ": " + e.getMessage(), e);
        }
    }

    private void giveBack(ModelProcess p, boolean keep) {
        synchronized (this) {
            if (!keep || closed) {
                all.remove(p);
                if (!keep) {
                    p.kill();
                    failures.incrementAndGet();
                } else {
                    p.close();
                }
                return;
            }
        }
        idle.addFirst(p);
    }

    private String describe(ModelProcess.Answer answer) {
        if (answer instanceof ModelProcess.Exited e) {
            return "exited with code " + e.code();
        }
        return answer instanceof ModelProcess.TimedOut ? "no answer within " + Durations.format(timeout) : "a line too long";
    }

    /** How many times a process was started to replace one that failed. */
    int restarts() {
        return restarts.get();
    }

    @Override
    public String describe() {
        return name;
    }

    @Override
    public void close() {
        List<ModelProcess> running;
        synchronized (this) {
            closed = true;
            running = new ArrayList<>(all);
            all.clear();
        }
        idle.clear();
        for (ModelProcess p : running) {
            p.close();
        }
    }
}
