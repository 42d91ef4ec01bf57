package dev.rootform.architecture;

import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.library.dependencies.SliceAssignment;
import com.tngtech.archunit.library.dependencies.SliceIdentifier;
import java.util.Arrays;

/**
 * Slices of the project by module subpackage: {@code dev.rootform.numeric.analysis} (with its own
 * subpackages) is one slice, and the classes directly in a module's root package, such as
 * {@code dev.rootform.export}, form another. A plain {@code dev.rootform.*.(*)..} pattern would
 * leave the root package out and merge equally named subpackages of different modules.
 */
final class Subpackages implements SliceAssignment {
    private static final int DEPTH = 4;

    @Override
    public SliceIdentifier getIdentifierOf(JavaClass javaClass) {
        String[] parts = javaClass.getPackageName().split("\\.");
        if (parts.length < 3 || !parts[0].equals("dev") || !parts[1].equals("rootform")) {
            return SliceIdentifier.ignore();
        }
        return SliceIdentifier.of(String.join(".", Arrays.copyOf(parts, Math.min(parts.length, DEPTH))));
    }

    @Override
    public String getDescription() {
        return "subpackages of the modules (dev.rootform.MODULE or dev.rootform.MODULE.SUBPACKAGE)";
    }
}
