package dev.rootform.architecture;

import com.tngtech.archunit.base.DescribedPredicate;
import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.domain.JavaCodeUnit;
import com.tngtech.archunit.core.domain.JavaField;
import com.tngtech.archunit.core.domain.JavaMember;
import com.tngtech.archunit.core.domain.JavaModifier;
import com.tngtech.archunit.core.domain.JavaType;
import com.tngtech.archunit.core.domain.PackageMatchers;
import com.tngtech.archunit.lang.ArchCondition;
import com.tngtech.archunit.lang.ConditionEvents;
import com.tngtech.archunit.lang.SimpleConditionEvent;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;

/**
 * The public signature of a type: what code outside its module can see. For a public type (whose
 * enclosing types are public too) these are its supertypes and type parameters, and the fields,
 * constructors and methods that are public or protected with their parameter, return, field and
 * thrown types, type parameters and every generic type argument inside them.
 */
final class PublicSignatures {
    /** Public types whose enclosing types, if any, are public. */
    static final DescribedPredicate<JavaClass> ARE_VISIBLE_OUTSIDE_THE_MODULE =
            DescribedPredicate.describe("are visible outside their module", PublicSignatures::visible);

    private PublicSignatures() {
    }

    /** Every type named in the public signature lies in one of {@code packages} (ArchUnit package patterns). */
    static ArchCondition<JavaClass> nameOnlyTypesFrom(String... packages) {
        PackageMatchers allowed = PackageMatchers.of(packages);
        return new ArchCondition<>("name only types from " + String.join(", ", packages) + " in their public signatures") {
            @Override
            public void check(JavaClass type, ConditionEvents events) {
                for (Part part : parts(type)) {
                    for (JavaClass named : part.type().getAllInvolvedRawTypes()) {
                        if (!named.isPrimitive() && !allowed.test(named.getPackageName())) {
                            events.add(SimpleConditionEvent.violated(type, part.where() + " names " + named.getName()));
                        }
                    }
                }
            }
        };
    }

    private static boolean visible(JavaClass type) {
        return type.getModifiers().contains(JavaModifier.PUBLIC)
                && type.getEnclosingClass().map(PublicSignatures::visible).orElse(true);
    }

    /** One place of a signature and the type written there. */
    private record Part(String where, JavaType type) {
    }

    private static List<Part> parts(JavaClass type) {
        List<Part> parts = new ArrayList<>();
        type.getSuperclass().ifPresent(s -> parts.add(new Part(type.getName() + " extends", s)));
        type.getInterfaces().forEach(i -> parts.add(new Part(type.getName() + " implements", i)));
        type.getTypeParameters().forEach(p -> parts.add(new Part(type.getName() + " type parameter", p)));
        type.getMembers().stream().filter(PublicSignatures::exposed).forEach(m -> parts.addAll(parts(m)));
        return parts;
    }

    private static boolean exposed(JavaMember member) {
        Set<JavaModifier> modifiers = member.getModifiers();
        return modifiers.contains(JavaModifier.PUBLIC) || modifiers.contains(JavaModifier.PROTECTED);
    }

    private static List<Part> parts(JavaMember member) {
        String where = member.getFullName();
        if (member instanceof JavaField f) {
            return List.of(new Part(where + " type", f.getType()));
        }
        JavaCodeUnit unit = (JavaCodeUnit) member;
        return Stream.of(
                Stream.of(new Part(where + " return type", unit.getReturnType())),
                unit.getParameterTypes().stream().map(p -> new Part(where + " parameter", p)),
                unit.getThrowsClause().getTypes().stream().map(t -> new Part(where + " throws", t)),
                unit.getTypeParameters().stream().map(p -> new Part(where + " type parameter", p)))
                .flatMap(s -> s).toList();
    }
}
