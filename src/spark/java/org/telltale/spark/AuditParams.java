package org.telltale.spark;

import java.io.Serializable;
import org.telltale.audit.AuditSettings;
import org.telltale.explain.ExplainSettings;

/**
 * What a task of the distributed audit needs besides its partition: the model options, the
 * analyzer spec, the explanation knobs and the seed, all as plain values Spark can ship.
 */
record AuditParams(ModelParams model, String modelWhere, String analyzer, int sample, int probes, int words, long seed,
                   AuditSettings settings)
        implements Serializable {

    /** The explanation settings of {@code telltale audit} ({@link AuditSettings#explainSettings}). */
    ExplainSettings explainSettings() {
        return settings.explainSettings(seed);
    }
}
