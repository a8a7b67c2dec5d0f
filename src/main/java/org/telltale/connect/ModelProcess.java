package org.telltale.connect;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.Reader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.ArrayDeque;
import java.util.List;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.TimeUnit;

/**
 * One running model subprocess: writes a request line to its stdin, waits for one answer line on
 * its stdout (at most the timeout), and keeps the tail of its stderr for error messages. Not
 * thread-safe: {@link SubprocessScorer} lends each process to one batch at a time.
 */
final class ModelProcess implements AutoCloseable {
    /** An answer line longer than this is garbage, not a score matrix. */
    static final int MAX_LINE_CHARS = 64 << 20;
    private static final int STDERR_TAIL_CHARS = 2000;
    private static final int STDERR_WAIT_SECONDS = 5;
    private static final Object EOF = new Object();

    private final Process process;
    private final OutputStream stdin;
    private final BlockingQueue<Object> lines = new ArrayBlockingQueue<>(4);
    private final ArrayDeque<Character> stderrTail = new ArrayDeque<>();
    private final String name;
    private final Thread stderrReader;
    private int exchanges;

    private ModelProcess(Process process, String name) {
        this.process = process;
        this.name = name;
        this.stdin = process.getOutputStream();
        Thread out = new Thread(this::readStdout, "telltale-model-stdout");
        out.setDaemon(true);
        out.start();
        stderrReader = new Thread(this::readStderr, "telltale-model-stderr");
        stderrReader.setDaemon(true);
        stderrReader.start();
    }

    static ModelProcess start(List<String> command, String name) throws IOException {
        ProcessBuilder pb = new ProcessBuilder(command);
        pb.redirectInput(ProcessBuilder.Redirect.PIPE);
        pb.redirectOutput(ProcessBuilder.Redirect.PIPE);
        pb.redirectError(ProcessBuilder.Redirect.PIPE);
        return new ModelProcess(pb.start(), name);
    }

    /** Outcome of one exchange. */
    sealed interface Answer permits Line, Exited, TimedOut, TooLong {
    }

    record Line(String text) implements Answer {
    }

    record Exited(int code) implements Answer {
    }

    record TimedOut() implements Answer {
    }

    record TooLong() implements Answer {
    }

    /** Sends one request line and waits for one answer line, at most {@code timeout}. */
    Answer exchange(byte[] request, Duration timeout) throws InterruptedException {
        exchanges++;
        try {
            stdin.write(request);
            stdin.write('\n');
            stdin.flush();
        } catch (IOException e) {
            return new Exited(waitForExit());
        }
        Object got = lines.poll(timeout.toMillis(), TimeUnit.MILLISECONDS);
        if (got == null) {
            return new TimedOut();
        }
        if (got == EOF) {
            return new Exited(waitForExit());
        }
        if (got instanceof TooLong t) {
            return t;
        }
        return new Line((String) got);
    }

    private int waitForExit() throws InterruptedException {
        if (process.waitFor(2, TimeUnit.SECONDS)) {
            return process.exitValue();
        }
        return -1;
    }

    private void readStdout() {
        try (Reader in = new InputStreamReader(process.getInputStream(), StandardCharsets.UTF_8)) {
            StringBuilder line = new StringBuilder();
            boolean overflow = false;
            int c;
            while ((c = in.read()) != -1) {
                if (c == '\n') {
                    lines.put(overflow ? new TooLong() : stripCr(line));
                    line.setLength(0);
                    overflow = false;
                } else if (!overflow) {
                    line.append((char) c);
                    if (line.length() > MAX_LINE_CHARS) {
                        overflow = true;
                        line = new StringBuilder();
                    }
                }
            }
            if (overflow) {
                lines.put(new TooLong());
            }
        } catch (IOException e) {
            // The process is gone or was killed; EOF below tells the waiting batch.
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } finally {
            lines.offer(EOF);
        }
    }

    private static String stripCr(StringBuilder line) {
        int n = line.length();
        return n > 0 && line.charAt(n - 1) == '\r' ? line.substring(0, n - 1) : line.toString();
    }

    private void readStderr() {
        try (InputStream err = process.getErrorStream()) {
            Reader in = new InputStreamReader(err, StandardCharsets.UTF_8);
            char[] buf = new char[4096];
            int n;
            while ((n = in.read(buf)) != -1) {
                synchronized (stderrTail) {
                    for (int i = 0; i < n; i++) {
                        stderrTail.addLast(buf[i]);
                        if (stderrTail.size() > STDERR_TAIL_CHARS) {
                            stderrTail.removeFirst();
                        }
                    }
                }
            }
        } catch (IOException e) {
            // Nothing more to keep.
        }
    }

    /** The last lines the process wrote to stderr, one line, or "" when it wrote none. */
    String stderrTail() {
        try {
            // A process that has exited (or was killed): let the reader catch its dying words. Both
            // waits end as soon as the event happens; the bounds only matter for a process whose
            // stderr stays open (a child that inherited it), and are generous for a busy machine.
            if (process.waitFor(STDERR_WAIT_SECONDS, TimeUnit.SECONDS)) {
                stderrReader.join(STDERR_WAIT_SECONDS * 1000L);
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        StringBuilder sb = new StringBuilder();
        synchronized (stderrTail) {
            for (char c : stderrTail) {
                sb.append(c);
            }
        }
        String s = sb.toString().strip();
        return s.isEmpty() ? "" : "; its stderr ends: " + s.replaceAll("\\s*\\R\\s*", " | ");
    }

    /** How many requests were sent to this process. */
    int exchanges() {
        return exchanges;
    }

    boolean isAlive() {
        return process.isAlive();
    }

    String name() {
        return name;
    }

    /** Kills the process at once (a hung or confused one). */
    void kill() {
        process.destroyForcibly();
    }

    /** Closes stdin so a well-behaved model exits, then makes sure it does. */
    @Override
    public void close() {
        try {
            stdin.close();
        } catch (IOException e) {
            // already gone
        }
        try {
            if (!process.waitFor(2, TimeUnit.SECONDS)) {
                process.destroy();
                if (!process.waitFor(2, TimeUnit.SECONDS)) {
                    process.destroyForcibly();
                }
            }
        } catch (InterruptedException e) {
            process.destroyForcibly();
            Thread.currentThread().interrupt();
        }
    }
}
