package org.telltale.serve;

import java.time.Duration;

/**
 * Bounds how long the JDK's HttpServer waits for a client to send its request, so that a client
 * that sends its headers byte by byte (or not at all) is cut off instead of holding a thread for
 * ever. The JDK reads these limits from system properties once, when the first server starts;
 * values the operator set on the command line win.
 */
final class SlowClientLimits {
    private SlowClientLimits() {
    }

    static synchronized void apply(Duration requestTime) {
        long seconds = Math.max(1, requestTime.toSeconds());
        setIfAbsent("sun.net.httpserver.maxReqTime", Long.toString(seconds));
        setIfAbsent("sun.net.httpserver.maxRspTime", Long.toString(Math.max(60, seconds * 2)));
        // Connections kept alive without traffic are closed after this many seconds.
        setIfAbsent("sun.net.httpserver.idleInterval", "30");
        setIfAbsent("sun.net.httpserver.maxReqHeaders", "100");
    }

    private static void setIfAbsent(String key, String value) {
        if (System.getProperty(key) == null) {
            System.setProperty(key, value);
        }
    }
}
