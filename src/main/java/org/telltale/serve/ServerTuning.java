package org.telltale.serve;

import java.time.Duration;

/**
 * Tunes the JDK's HttpServer through the system properties it reads once, when the first server
 * starts; values the operator set on the command line win.
 * <ul>
 *   <li>A bound on how long a client may take to send its request, so that one that sends its
 *       headers byte by byte (or not at all) is cut off instead of holding a thread for ever.</li>
 *   <li>TCP_NODELAY: the server writes headers and body separately, and with Nagle's algorithm the
 *       body would wait for the client's delayed ACK, about 40 ms per answer on Linux.</li>
 * </ul>
 */
final class ServerTuning {
    private ServerTuning() {
    }

    static synchronized void apply(Duration requestTime) {
        long seconds = Math.max(1, requestTime.toSeconds());
        setIfAbsent("sun.net.httpserver.maxReqTime", Long.toString(seconds));
        setIfAbsent("sun.net.httpserver.maxRspTime", Long.toString(Math.max(60, seconds * 2)));
        // Connections kept alive without traffic are closed after this many seconds.
        setIfAbsent("sun.net.httpserver.idleInterval", "30");
        setIfAbsent("sun.net.httpserver.maxReqHeaders", "100");
        setIfAbsent("sun.net.httpserver.nodelay", "true");
    }

    private static void setIfAbsent(String key, String value) {
        if (System.getProperty(key) == null) {
            System.setProperty(key, value);
        }
    }
}
