package org.telltale.spark;

import java.io.Serializable;
import org.telltale.overlap.Banding;
import org.telltale.overlap.OverlapSettings;

/** The overlap settings in a form Spark can ship to its tasks, where they become {@link OverlapSettings} again. */
record OverlapParams(double threshold, int shingle, int signature, int rows, int bands, long seed, boolean keepTexts)
        implements Serializable {
    static OverlapParams of(OverlapSettings s) {
        return new OverlapParams(s.threshold(), s.shingle(), s.signature(), s.banding().rows(), s.banding().bands(),
                s.seed(), s.keepTexts());
    }

    OverlapSettings settings() {
        return new OverlapSettings(threshold, shingle, signature, new Banding(rows, bands), seed, 1, keepTexts);
    }
}
