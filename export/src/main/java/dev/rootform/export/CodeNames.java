package dev.rootform.export;

import java.util.Objects;
import java.util.Optional;

/**
 * Names used by generated code, and the variant of generated C.
 *
 * @param packageName the Java package, or empty for none
 * @param className the Java class
 * @param function the C function
 * @param headerFile the C header's file name when the declaration goes to its own file
 * @param c the floating type of generated C and whether it may call the math library
 * @since 0.2
 */
public record CodeNames(Optional<String> packageName, String className, String function, Optional<String> headerFile,
        CVariant c) {
    /** Default Java class name. */
    public static final String DEFAULT_CLASS = "Solution";
    /** Default C function name. */
    public static final String DEFAULT_FUNCTION = "rootform_value";

    public CodeNames {
        Objects.requireNonNull(packageName, "packageName");
        Objects.requireNonNull(className, "className");
        Objects.requireNonNull(function, "function");
        Objects.requireNonNull(headerFile, "headerFile");
        Objects.requireNonNull(c, "c");
    }

    /** Names for double-precision C with the math library ({@link CVariant#DEFAULT}). */
    public CodeNames(Optional<String> packageName, String className, String function, Optional<String> headerFile) {
        this(packageName, className, function, headerFile, CVariant.DEFAULT);
    }

    /** No package, class {@code Solution}, function {@code rootform_value}, no header file, default C. */
    public static CodeNames defaults() {
        return new CodeNames(Optional.empty(), DEFAULT_CLASS, DEFAULT_FUNCTION, Optional.empty());
    }
}
