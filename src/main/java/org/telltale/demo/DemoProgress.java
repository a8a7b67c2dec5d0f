package org.telltale.demo;

/**
 * Where the demo reports what it is doing: one short line per step, for a person watching
 * (stderr on the command line). {@link #silent()} drops everything.
 */
@FunctionalInterface
public interface DemoProgress {
    void step(String message);

    static DemoProgress silent() {
        return message -> { };
    }
}
