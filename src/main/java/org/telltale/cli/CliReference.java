package org.telltale.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import picocli.CommandLine;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.Model.PositionalParamSpec;

/**
 * Writes {@code docs/cli.md} from the picocli model, so the reference cannot drift from the code.
 * Run {@code java -cp target/classes:... org.telltale.cli.CliReference docs/cli.md}, or let
 * {@code CliReferenceTest} tell you when the committed file is stale.
 */
public final class CliReference {
    private CliReference() {
    }

    public static void main(String[] args) throws IOException {
        Path out = Path.of(args.length > 0 ? args[0] : "docs/cli.md");
        Files.writeString(out, markdown(), StandardCharsets.UTF_8);
    }

    /**
     * The whole reference as Markdown. picocli sorts synopsis options with the default locale's
     * collation, so the default is pinned to {@link Locale#ROOT} while the text is built: the file
     * must not depend on who generated it.
     */
    public static synchronized String markdown() {
        Locale before = Locale.getDefault();
        Locale.setDefault(Locale.ROOT);
        try {
            return build();
        } finally {
            Locale.setDefault(before);
        }
    }

    private static String build() {
        CommandLine root = Main.commandLine();
        StringBuilder md = new StringBuilder();
        md.append("# Command-line reference\n\n")
                .append("Generated from the picocli model by `org.telltale.cli.CliReference`; do not edit by hand.\n")
                .append("Regenerate with `mvn -q -DskipTests package && java -cp target/telltale.jar ")
                .append("org.telltale.cli.CliReference docs/cli.md`.\n\n")
                .append("Exit codes: 0 ok, 1 error, 2 usage error, 3 audit artefacts at or above `--fail-on`.\n\n");
        command(md, root, "telltale");
        for (Map.Entry<String, CommandLine> sub : root.getSubcommands().entrySet()) {
            command(md, sub.getValue(), "telltale " + sub.getKey());
        }
        return md.toString();
    }

    private static void command(StringBuilder md, CommandLine cli, String title) {
        CommandSpec spec = cli.getCommandSpec();
        md.append("## `").append(title).append("`\n\n");
        for (String line : spec.usageMessage().description()) {
            md.append(line).append('\n');
        }
        md.append("\n```\n").append(synopsis(cli)).append("```\n\n");
        List<PositionalParamSpec> positionals = spec.positionalParameters();
        List<OptionSpec> options = spec.options();
        if (options.isEmpty() && positionals.isEmpty()) {
            return;
        }
        md.append("| option | description | default |\n|---|---|---|\n");
        for (PositionalParamSpec p : positionals) {
            md.append("| `").append(p.paramLabel()).append("` | ").append(cell(String.join(" ", p.description())))
                    .append(" | |\n");
        }
        for (OptionSpec o : options) {
            String names = String.join(", ", o.names());
            String label = o.typeInfo().isBoolean() ? "" : " " + o.paramLabel();
            String def = o.defaultValue() == null ? "" : o.defaultValue().isEmpty() ? "(empty)" : "`" + o.defaultValue() + "`";
            md.append("| `").append(names).append(label).append("` | ")
                    .append(cell(String.join(" ", o.description()))).append(" | ").append(cell(def)).append(" |\n");
        }
        md.append('\n');
    }

    private static String synopsis(CommandLine cli) {
        CommandLine.Help help = new CommandLine.Help(cli.getCommandSpec(), CommandLine.Help.defaultColorScheme(CommandLine.Help.Ansi.OFF));
        return help.synopsis(0);
    }

    private static String cell(String text) {
        return text.replace("|", "\\|").replace("\n", " ").replace("${DEFAULT-VALUE}", "default shown");
    }
}
