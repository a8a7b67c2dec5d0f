package org.telltale.connect;

import java.nio.file.Path;

/** Builds {@code exec:} specs that run a class of this build in a fresh JVM. */
final class JavaProcess {
    private JavaProcess() {
    }

    static String java() {
        return Path.of(System.getProperty("java.home"), "bin", "java").toString();
    }

    static String quote(String s) {
        return "'" + s.replace("'", "'\\''") + "'";
    }

    /** {@code exec:JAVA -cp CLASSPATH MAIN ARGS…}, every word quoted. */
    static String spec(String mainClass, String... args) {
        StringBuilder sb = new StringBuilder("exec:").append(quote(java()))
                .append(" -Xshare:auto -XX:TieredStopAtLevel=1 -cp ").append(quote(System.getProperty("java.class.path")))
                .append(' ').append(mainClass);
        for (String a : args) {
            sb.append(' ').append(quote(a));
        }
        return sb.toString();
    }
}
