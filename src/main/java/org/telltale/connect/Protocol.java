package org.telltale.connect;

import java.util.Locale;
import org.telltale.EnumKeys;

/** The JSON exchange an HTTP connector speaks with a model service. */
public enum Protocol {
    /** Telltale's scoring protocol: {@code {"texts": […]}} → {@code {"labels": […], "scores": [[…]]}}. */
    NATIVE,
    /** Open Inference Protocol v2: a BYTES input tensor of texts, an FP32 output tensor [n, labels]. */
    OPEN_INFERENCE,
    /** The common {@code {"instances": […]}} → {@code {"predictions": […]}} shape. */
    INSTANCES,
    /** The text-classification pipeline shape: {@code {"inputs": […]}} → per text a list of {@code {"label", "score"}}. */
    PIPELINE;

    /** The name used on the command line and in docs, e.g. {@code open-inference}. */
    public String cliName() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    /** Parses {@code native}, {@code open-inference}, {@code instances} or {@code pipeline}, ignoring case. */
    public static Protocol byName(String name) {
        return EnumKeys.parse("protocol", name == null ? null : name.strip().toLowerCase(Locale.ROOT), values(),
                Protocol::cliName);
    }
}
