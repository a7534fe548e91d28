package org.eigenzeit.onboard.status;

import java.lang.annotation.Documented;
import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;

/**
 * The result of the annotated method (a {@link Status} code, as a rule) must be used by every
 * caller: a dropped status is a silently accepted fault. Error Prone's {@code CheckReturnValue}
 * check recognises an annotation of this simple name and is enabled at ERROR for the core (and,
 * at its default severity ERROR, for every module that calls it), so a caller that ignores the
 * result does not compile.
 *
 * <p>Class retention: the compiler of a calling module sees it in the core's class files.
 */
@Documented
@Retention(RetentionPolicy.CLASS)
@Target({ElementType.METHOD, ElementType.CONSTRUCTOR, ElementType.TYPE, ElementType.PACKAGE})
public @interface CheckReturnValue {}
