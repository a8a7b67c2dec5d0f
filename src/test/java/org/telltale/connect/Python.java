package org.telltale.connect;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/** Finds python3 and copies test scripts out of the class path, for subprocess tests. */
final class Python {
    private Python() {
    }

    /** Debian's python3 when present (quick to start), else whatever python3 is on the PATH. */
    static String python3() {
        return Files.isExecutable(Path.of("/usr/bin/python3")) ? "/usr/bin/python3" : "python3";
    }

    static Path script(String resource, Path dir) throws IOException {
        Path target = dir.resolve(resource.substring(resource.lastIndexOf('/') + 1));
        try (InputStream in = Python.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IOException("missing test resource " + resource);
            }
            Files.copy(in, target, StandardCopyOption.REPLACE_EXISTING);
        }
        return target;
    }
}
