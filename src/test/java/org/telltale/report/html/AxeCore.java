package org.telltale.report.html;

import static org.junit.jupiter.api.Assertions.fail;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Runs the WCAG 2 level A and AA rules of axe-core (npm {@code axe-core}, fetched into target/npm
 * by src/test/npm/fetch.sh) on the page open in a {@link HeadlessChromium} and returns each
 * violation as readable lines: rule, impact, help, and the offending nodes with axe's own summary.
 *
 * <p>The script is injected through WebDriver, which the report's Content-Security-Policy does not
 * govern, so the report itself needs no exception for it. Missing package: the calling test is
 * skipped locally with a message and fails under {@code CI}.
 */
final class AxeCore {
    static final Path SCRIPT = Path.of("target/npm/node_modules/axe-core/axe.min.js");
    /** axe-core's tags for the success criteria of WCAG 2.0, 2.1 and 2.2 at levels A and AA. */
    static final List<String> WCAG_A_AA = List.of("wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "wcag22aa");

    private AxeCore() {
    }

    /** The violations on the current page; an empty list when every rule passes or does not apply. */
    static List<String> violations(HeadlessChromium chromium) throws IOException {
        boolean present = Files.isRegularFile(SCRIPT);
        if (!present && System.getenv("CI") != null) {
            fail("CI is set but " + SCRIPT + " is missing; `mvn generate-test-resources` fetches it with npm");
        }
        assumeTrue(present, "accessibility rules skipped: " + SCRIPT + " is missing (install npm, run mvn generate-test-resources)");
        chromium.js(Files.readString(SCRIPT, StandardCharsets.UTF_8));
        Object answer = chromium.driver.executeAsyncScript(
                "const done = arguments[arguments.length - 1];"
                        + "axe.run(document, {runOnly: {type: 'tag', values: arguments[0]}, resultTypes: ['violations']})"
                        + ".then(r => done({version: axe.version, passes: r.passes.length, violations: r.violations.map(v => ({"
                        + "id: v.id, impact: v.impact, help: v.help, nodes: v.nodes.map(n => ({target: n.target.join(' '),"
                        + " html: n.html, summary: n.failureSummary}))}))}))"
                        + ".catch(e => done({error: String(e)}));",
                WCAG_A_AA);
        Map<?, ?> result = (Map<?, ?>) answer;
        if (result.containsKey("error")) {
            throw new AssertionError("axe-core did not run: " + result.get("error"));
        }
        List<String> lines = new ArrayList<>();
        for (Object v : (List<?>) result.get("violations")) {
            Map<?, ?> violation = (Map<?, ?>) v;
            lines.add(violation.get("id") + " (" + violation.get("impact") + "): " + violation.get("help"));
            for (Object n : (List<?>) violation.get("nodes")) {
                Map<?, ?> node = (Map<?, ?>) n;
                lines.add("    at " + node.get("target") + "  " + node.get("html"));
                lines.add("       " + String.valueOf(node.get("summary")).replace("\n", "\n       "));
            }
        }
        return lines;
    }
}
