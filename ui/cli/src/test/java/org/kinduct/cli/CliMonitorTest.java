package org.kinduct.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.concurrent.atomic.AtomicLong;
import org.junit.jupiter.api.Test;

/** Progress on a terminal: silent for short runs, one line rewritten in place, cleared at the end. */
class CliMonitorTest {

    private final AtomicLong clock = new AtomicLong();
    private final ByteArrayOutputStream err = new ByteArrayOutputStream();

    private CliMonitor onTerminal() {
        return new CliMonitor(new PrintStream(err, true, StandardCharsets.UTF_8), clock::get);
    }

    private String shown() {
        return err.toString(StandardCharsets.UTF_8);
    }

    @Test
    void aShortRunShowsNothing() {
        CliMonitor m = onTerminal();
        clock.set(CliMonitor.QUIET_NS - 1);
        m.progress(0.5);
        m.done();
        assertEquals("", shown());
    }

    @Test
    void aLongRunRewritesOneLineAtMostFourTimesASecondAndClearsIt() {
        CliMonitor m = onTerminal();
        clock.set(CliMonitor.QUIET_NS);
        m.progress(0.42);
        clock.addAndGet(CliMonitor.INTERVAL_NS / 2);
        m.progress(0.43);
        clock.addAndGet(CliMonitor.INTERVAL_NS);
        m.progress(0.44);
        assertEquals("\rkinduct: solving… 42 % (Ctrl-C stops)\rkinduct: solving… 44 % (Ctrl-C stops)", shown());
        m.done();
        assertTrue(shown().endsWith("\r" + " ".repeat(48) + "\r"), shown());
    }

    @Test
    void withoutATerminalNothingIsShownButAStopIsStillAsked() {
        CliMonitor m = new CliMonitor(null, clock::get);
        clock.set(10 * CliMonitor.QUIET_NS);
        m.progress(0.5);
        m.done();
        m.stop();
        assertTrue(m.cancelled());
        assertEquals("", shown());
    }
}
