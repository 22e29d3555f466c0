package dev.odetab.cli;

import dev.odetab.base.Progress;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.concurrent.atomic.AtomicLong;
import me.tongfei.progressbar.ConsoleProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;

/**
 * A progress bar of {@code build} on stderr (how much is done, of how much, rate and time
 * left), drawn by the progressbar library: one for evaluating the tables (rows; a zeros table
 * adds its rows when its search ends, since their number is not known before), one for
 * writing the outputs (entries). A bar appears only once its phase has run for {@link #DELAY}
 * (a shorter one shows nothing) and only when stderr is a terminal; it never writes to stdout
 * and never changes what is computed.
 */
final class ProgressDisplay implements Progress, AutoCloseable {
    /** How long a build runs before the bar appears. */
    static final Duration DELAY = Duration.ofSeconds(1);

    private final String task;
    private final String unit;
    private final PrintStream stream;
    private final long startNanos = System.nanoTime();
    private final AtomicLong total = new AtomicLong();
    private final AtomicLong done = new AtomicLong();
    private volatile ProgressBar bar;
    private boolean closed;

    private ProgressDisplay(String task, String unit, PrintStream stream) {
        this.task = task;
        this.unit = unit;
        this.stream = stream;
    }

    /**
     * The progress of a phase of a build, counted in {@code unit}s: a bar on stderr when the
     * process's own streams are in use ({@code main}, not a caller in the same JVM), stderr is a
     * terminal and {@code quiet} is off; otherwise a display that shows nothing.
     */
    static ProgressDisplay forBuild(String task, String unit, boolean quiet) {
        return new ProgressDisplay(task, unit, !quiet && Main.processStreams() && stderrIsTerminal() ? System.err : null);
    }

    /**
     * Whether stderr is a terminal. Java 17 cannot ask this of one stream. Where
     * {@code /proc/self/fd} exists (Linux) the target of {@code 2} is read: a terminal is a
     * {@code /dev/pts/N} or {@code /dev/ttyN} device. Elsewhere {@link System#console()} stands
     * in for it: non-null when stdin and stdout are terminals, which is usually the case of
     * stderr too in an interactive shell.
     */
    static boolean stderrIsTerminal() {
        Path fds = Path.of("/proc/self/fd");
        if (Files.isDirectory(fds)) {
            try {
                String target = Files.readSymbolicLink(fds.resolve("2")).toString();
                return target.startsWith("/dev/pts/") || target.startsWith("/dev/tty");
            } catch (IOException | UnsupportedOperationException e) {
                return false;
            }
        }
        return System.console() != null;
    }

    @Override
    public void start(String table, long units) {
        long t = total.addAndGet(units);
        ProgressBar b = bar;
        if (b != null) {
            b.maxHint(Math.max(t, done.get()));
        }
    }

    @Override
    public void advance(long units) {
        if (stream == null) {
            return;
        }
        long d = done.addAndGet(units);
        ProgressBar b = bar;
        if (b == null) {
            long elapsed = System.nanoTime() - startNanos;
            if (elapsed < DELAY.toNanos()) {
                return;
            }
            b = show(d, Duration.ofNanos(elapsed));
            if (b == null) {
                return;
            }
        }
        if (d > b.getMax()) {
            // a user template listed an array more often than estimated
            b.maxHint(d);
        }
        b.stepTo(d);
    }

    private synchronized ProgressBar show(long processed, Duration elapsed) {
        if (bar == null && !closed) {
            bar = new ProgressBarBuilder().setTaskName(task).setInitialMax(Math.max(total.get(), processed)).setUnit(" " + unit, 1)
                    .showSpeed().setStyle(ProgressBarStyle.ASCII).setConsumer(new ConsoleProgressBarConsumer(stream))
                    .startsFrom(processed, elapsed).build();
        }
        return bar;
    }

    /** Draws the bar a last time and ends its line, when it was shown. */
    @Override
    public synchronized void close() {
        if (closed) {
            return;
        }
        closed = true;
        if (bar != null) {
            bar.stepTo(done.get());
            bar.close();
        }
    }
}
