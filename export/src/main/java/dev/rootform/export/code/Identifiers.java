package dev.rootform.export.code;

import java.util.Arrays;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Pattern;
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
    /**
     * Java's contextual keywords (JLS 17 §3.9), which {@link SourceVersion#isKeyword} does not
     * cover; {@code permits}, {@code record}, {@code sealed}, {@code var} and {@code yield} cannot
     * name a type (§3.8), and none of them is accepted as a class name or package segment.
     */
    private static final Set<String> JAVA_CONTEXTUAL = Set.of("exports", "module", "non-sealed", "open", "opens", "permits",
            "provides", "record", "requires", "sealed", "to", "transitive", "uses", "var", "with", "yield");
    /** C99 keywords (§6.4.1). */
    private static final Set<String> C_KEYWORDS = Set.of("auto", "break", "case", "char", "const", "continue",
            "default", "do", "double", "else", "enum", "extern", "float", "for", "goto", "if", "inline", "int", "long",
            "register", "restrict", "return", "short", "signed", "sizeof", "static", "struct", "switch", "typedef",
            "union", "unsigned", "void", "volatile", "while", "_Bool", "_Complex", "_Imaginary", "main");
    /**
     * Names of the C99 standard library (§7) that generated code or the code around it may see:
     * every function, macro and type of {@code <math.h>} (§7.12; the float and long double
     * variants with suffix f and l are added below), and the common names of {@code <stdio.h>},
     * {@code <stdlib.h>}, {@code <string.h>}, {@code <errno.h>}, {@code <assert.h>},
     * {@code <stddef.h>} and {@code <limits.h>}.
     */
    private static final Set<String> C_MATH = Set.of("acos", "asin", "atan", "atan2", "cos", "sin", "tan", "acosh", "asinh",
            "atanh", "cosh", "sinh", "tanh", "exp", "exp2", "expm1", "frexp", "ilogb", "ldexp", "log", "log10", "log1p", "log2",
            "logb", "modf", "scalbn", "scalbln", "cbrt", "fabs", "hypot", "pow", "sqrt", "erf", "erfc", "lgamma", "tgamma", "ceil",
            "floor", "nearbyint", "rint", "lrint", "llrint", "round", "lround", "llround", "trunc", "fmod", "remainder", "remquo",
            "copysign", "nan", "nextafter", "nexttoward", "fdim", "fmax", "fmin", "fma");
    private static final Set<String> C_LIBRARY = Set.of("HUGE_VAL", "HUGE_VALF", "HUGE_VALL", "INFINITY", "NAN", "FP_INFINITE",
            "FP_NAN", "FP_NORMAL", "FP_SUBNORMAL", "FP_ZERO", "FP_FAST_FMA", "FP_FAST_FMAF", "FP_FAST_FMAL", "FP_ILOGB0",
            "FP_ILOGBNAN", "MATH_ERRNO", "MATH_ERREXCEPT", "math_errhandling", "fpclassify", "isfinite", "isinf", "isnan",
            "isnormal", "signbit", "isgreater", "isgreaterequal", "isless", "islessequal", "islessgreater", "isunordered",
            "float_t", "double_t", "printf", "fprintf", "sprintf", "snprintf", "vprintf", "scanf", "fscanf", "sscanf", "puts",
            "fputs", "putchar", "putc", "fputc", "getchar", "getc", "fgetc", "gets", "fgets", "fopen", "fclose", "fflush",
            "fread", "fwrite", "fseek", "ftell", "rewind", "remove", "rename", "tmpfile", "perror", "stdin", "stdout", "stderr",
            "FILE", "EOF", "BUFSIZ", "malloc", "calloc", "realloc", "free", "exit", "abort", "atexit", "getenv", "system",
            "abs", "labs", "llabs", "div", "ldiv", "atoi", "atol", "atoll", "atof", "strtod", "strtof", "strtold", "strtol",
            "strtoul", "rand", "srand", "qsort", "bsearch", "RAND_MAX", "EXIT_SUCCESS", "EXIT_FAILURE", "memcpy", "memmove",
            "memset", "memcmp", "memchr", "strlen", "strcpy", "strncpy", "strcat", "strncat", "strcmp", "strncmp", "strchr",
            "strrchr", "strstr", "strtok", "errno", "EDOM", "ERANGE", "EILSEQ", "assert", "NULL", "size_t", "ptrdiff_t",
            "offsetof", "wchar_t", "INT_MAX", "INT_MIN", "LONG_MAX", "LONG_MIN", "CHAR_BIT", "bool", "true", "false");
    /**
     * Names the C99 standard reserves for future library use (§7.26): is/to + lowercase
     * ({@code <ctype.h>}), str/mem/wcs + lowercase ({@code <stdlib.h>}, {@code <string.h>}), E +
     * digit or uppercase ({@code <errno.h>}), and any name beginning with an underscore and an
     * uppercase letter or a second underscore (§7.1.3).
     */
    private static final Pattern C_RESERVED_PREFIX = Pattern.compile("(is|to|str|mem|wcs)[a-z].*|E[0-9A-Z].*|_[A-Z_].*");

    private Identifiers() {
    }

    /** A refusal unless {@code name} is a Java identifier, not a keyword, literal or contextual keyword. */
    public static Optional<String> javaClassRefusal(String name) {
        if (SourceVersion.isIdentifier(name) && isJavaWord(name)) {
            return refusal("--class", name, false, "a Java class name: it is a keyword of Java (JLS 17 §3.9)");
        }
        return refusal("--class", name, SourceVersion.isIdentifier(name), "a Java class name");
    }

    /**
     * A refusal unless {@code name} is a dotted Java package name without keywords, outside the
     * platform's {@code java}, {@code java.*} and {@code javax.*}.
     */
    public static Optional<String> javaPackageRefusal(String name) {
        String first = name.split("\\.", -1)[0];
        if (first.equals("java") || first.equals("javax")) {
            return refusal("--package", name, false, "a package of our own: java, java.* and javax.* belong to the Java platform");
        }
        boolean ok = SourceVersion.isName(name) && Arrays.stream(name.split("\\.", -1)).noneMatch(Identifiers::isJavaWord);
        return refusal("--package", name, ok, "a Java package name (identifiers that are no keywords, JLS 17 §3.9, joined by dots)");
    }

    private static boolean isJavaWord(String name) {
        return SourceVersion.isKeyword(name, SourceVersion.RELEASE_17) || JAVA_CONTEXTUAL.contains(name);
    }

    /**
     * A refusal unless {@code name} matches [A-Za-z_][A-Za-z0-9_]* (at most 63 characters), is no C
     * keyword and no name of the C99 standard library or reserved for it.
     */
    public static Optional<String> cFunctionRefusal(String option, String name) {
        if (!name.matches("[A-Za-z_][A-Za-z0-9_]{0,62}")) {
            return refusal(option, name, false, "a C identifier");
        }
        if (C_KEYWORDS.contains(name)) {
            return refusal(option, name, false, "a C identifier: it is a keyword of C99 (or main)");
        }
        boolean library = C_MATH.contains(name) || C_MATH.contains(name.replaceFirst("[fl]$", "")) || C_LIBRARY.contains(name)
                || C_RESERVED_PREFIX.matcher(name).matches();
        return refusal(option, name, !library, "a name of our own: the C99 standard library uses or reserves it (C99 §7)");
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
