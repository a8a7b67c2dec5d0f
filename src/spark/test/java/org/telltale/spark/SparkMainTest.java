package org.telltale.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.telltale.TelltaleException;
import org.telltale.UsageException;

/** The Spark fronts' one error line: the first Telltale error in the chain, in the options' words. */
class SparkMainTest {
    @Test
    void aCoreHintNamesTheOptionEvenWhenSparkWrappedTheError() {
        // Spark wraps an error raised in a task; the core wrote the setting as a placeholder.
        RuntimeException wrapped = new RuntimeException("Job aborted due to stage failure",
                new TelltaleException("a.jsonl:2: not valid JSON ({skipBad} skips and counts such lines)"));
        assertEquals("a.jsonl:2: not valid JSON (--skip-bad skips and counts such lines)", SparkMain.oneLine(wrapped));
    }

    @Test
    void aUsageErrorFromTheConnectorNamesTheOption() {
        assertEquals("--header applies to http:// and https:// models, not to an exec: model",
                SparkMain.oneLine(new UsageException("{header} applies to http:// and https:// models, not to an exec: model")));
    }

    @Test
    void anUnexpectedFailureNamesItsTypeAndTheVerboseSwitch() {
        assertEquals("IllegalStateException: broken (rerun with --verbose for details)",
                SparkMain.oneLine(new IllegalStateException("broken")));
    }
}
