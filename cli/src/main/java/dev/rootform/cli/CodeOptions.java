package dev.rootform.cli;

import dev.rootform.export.CodeNames;
import dev.rootform.export.Identifiers;
import dev.rootform.symbolic.parse.InputException;
import java.nio.file.Path;
import java.util.Optional;
import picocli.CommandLine.Option;

/** The options that name generated code, shared by every command that writes Java or C. */
final class CodeOptions {
    @Option(names = "--package", paramLabel = "NAME", description = "Java package of the generated class (default: none).")
    String packageName;

    @Option(names = "--class", paramLabel = "NAME", description = "Name of the generated Java class (default ${DEFAULT-VALUE}).")
    String className = CodeNames.DEFAULT_CLASS;

    @Option(names = "--function", paramLabel = "NAME", description = "Name of the generated C function (default ${DEFAULT-VALUE}).")
    String function = CodeNames.DEFAULT_FUNCTION;

    @Option(names = "--header", paramLabel = "FILE", description = "Write the C header to FILE (the source, on stdout or -o, includes it).")
    Path header;

    /** Checks the names before any work, so a bad name fails fast. */
    CodeNames names(String format) {
        Identifiers.javaClass(className);
        if (packageName != null) {
            Identifiers.javaPackage(packageName);
        }
        Identifiers.cFunction("--function", function);
        if (header != null) {
            if (!format.equals("c")) {
                throw new InputException("--header is for --format c", "", -1);
            }
            Identifiers.cHeader(header.getFileName().toString());
        }
        return new CodeNames(Optional.ofNullable(packageName), className, function,
                Optional.ofNullable(header).map(h -> h.getFileName().toString()));
    }
}
