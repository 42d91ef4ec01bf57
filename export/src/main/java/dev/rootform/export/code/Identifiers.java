package dev.rootform.export.code;

import java.util.Optional;
import java.util.Set;
import javax.lang.model.SourceVersion;

/**
 * Validation of the names put into generated code, so that nothing but a name can be injected
 * through them. Each check returns the refusal as one line naming the option and the name, or
 * nothing for an acceptable name; callers check before rendering, and the renderers reject a name
 * that fails.
 *
 * @since 0.2
 */
public final class Identifiers {
    /** C99 keywords, and the <math.h> functions generated C calls. */
    private static final Set<String> C_RESERVED = Set.of("auto", "break", "case", "char", "const", "continue",
            "default", "do", "double", "else", "enum", "extern", "float", "for", "goto", "if", "inline", "int", "long",
            "register", "restrict", "return", "short", "signed", "sizeof", "static", "struct", "switch", "typedef",
            "union", "unsigned", "void", "volatile", "while", "_Bool", "_Complex", "_Imaginary", "pow", "exp", "cos",
            "main");

    private Identifiers() {
    }

    /** A refusal unless {@code name} is a Java identifier and not a keyword or literal. */
    public static Optional<String> javaClassRefusal(String name) {
        return refusal("--class", name, SourceVersion.isIdentifier(name) && !SourceVersion.isKeyword(name), "a Java class name");
    }

    /** A refusal unless {@code name} is a dotted Java package name without keywords. */
    public static Optional<String> javaPackageRefusal(String name) {
        return refusal("--package", name, SourceVersion.isName(name), "a Java package name");
    }

    /** A refusal unless {@code name} matches [A-Za-z_][A-Za-z0-9_]* and is no C keyword or reserved name. */
    public static Optional<String> cFunctionRefusal(String option, String name) {
        boolean ok = name.matches("[A-Za-z_][A-Za-z0-9_]{0,62}") && !C_RESERVED.contains(name) && !name.startsWith("__")
                && !name.matches("_[A-Z].*");
        return refusal(option, name, ok, "a C identifier (not a keyword or reserved name)");
    }

    /** A refusal unless {@code fileName} is a plain header file name such as {@code fib.h}. */
    public static Optional<String> cHeaderRefusal(String fileName) {
        return refusal("--header", fileName, fileName.matches("[A-Za-z0-9_][A-Za-z0-9_.-]{0,62}\\.h"), "a plain header file name (NAME.h)");
    }

    private static Optional<String> refusal(String option, String name, boolean ok, String what) {
        if (ok) {
            return Optional.empty();
        }
        String shown = name.codePoints().allMatch(c -> c >= 0x20 && c < 0x7f) && name.length() <= 80 ? name : "(unprintable)";
        return Optional.of(option + " '" + shown + "' is not " + what);
    }
}
