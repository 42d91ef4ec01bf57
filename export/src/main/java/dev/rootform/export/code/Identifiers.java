package dev.rootform.export;

import dev.rootform.symbolic.model.InputException;
import java.util.Set;
import javax.lang.model.SourceVersion;

/**
 * Validation of the names put into generated code, so that nothing but a name can be injected
 * through them.
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

    /** @throws InputException unless {@code name} is a Java identifier and not a keyword or literal */
    public static String javaClass(String name) {
        return check("--class", name, SourceVersion.isIdentifier(name) && !SourceVersion.isKeyword(name), "a Java class name");
    }

    /** @throws InputException unless {@code name} is a dotted Java package name without keywords */
    public static String javaPackage(String name) {
        return check("--package", name, SourceVersion.isName(name), "a Java package name");
    }

    /** @throws InputException unless {@code name} matches [A-Za-z_][A-Za-z0-9_]* and is no C keyword or reserved name */
    public static String cFunction(String option, String name) {
        boolean ok = name.matches("[A-Za-z_][A-Za-z0-9_]{0,62}") && !C_RESERVED.contains(name) && !name.startsWith("__")
                && !name.matches("_[A-Z].*");
        return check(option, name, ok, "a C identifier (not a keyword or reserved name)");
    }

    /** @throws InputException unless {@code fileName} is a plain header file name such as {@code fib.h} */
    public static String cHeader(String fileName) {
        return check("--header", fileName, fileName.matches("[A-Za-z0-9_][A-Za-z0-9_.-]{0,62}\\.h"), "a plain header file name (NAME.h)");
    }

    private static String check(String option, String name, boolean ok, String what) {
        if (!ok) {
            String shown = name.codePoints().allMatch(c -> c >= 0x20 && c < 0x7f) && name.length() <= 80 ? name : "(unprintable)";
            throw new InputException(option + " '" + shown + "' is not " + what, "", -1);
        }
        return name;
    }
}
