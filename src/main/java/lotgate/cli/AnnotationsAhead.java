package lotgate.cli;

import java.lang.reflect.AccessibleObject;
import java.lang.reflect.Field;
import java.lang.reflect.ParameterizedType;
import java.lang.reflect.Type;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Mixin;

/**
 * Reads the annotations of the command a run invokes on a second thread, while picocli sets itself up on the
 * first. The JDK makes a class for every annotation type the first time one is read, in interpreted code, and
 * that is a third of picocli's model of a short command (20-30 ms); picocli's own set-up before it reads the first
 * annotation (its converters, patterns and help defaults) takes 10-15 ms, in which the second core does the
 * reading. The JDK keeps what was read with the class's fields and methods, where picocli finds it. Nothing
 * depends on this thread: it only reads, never fails the run, and the JVM does not wait for it at exit.
 */
final class AnnotationsAhead implements Runnable {
    private final List<Class<?>> classes;

    private AnnotationsAhead(List<Class<?>> classes) {
        this.classes = classes;
    }

    /** Starts reading the annotations of these classes, their mixins and argument groups, in this order. */
    static void start(List<Class<?>> classes) {
        Thread reader = new Thread(new AnnotationsAhead(classes), "lotgate-annotations");
        reader.setDaemon(true);
        reader.start();
    }

    @Override
    public void run() {
        try {
            Set<Class<?>> seen = new HashSet<>();
            for (Class<?> type : classes) {
                read(type, seen);
            }
        } catch (RuntimeException | LinkageError ignored) {
            // picocli reads the same annotations itself and reports any fault in them.
        }
    }

    private static void read(Class<?> type, Set<Class<?>> seen) {
        // picocli reads every class of a command's hierarchy, java.lang.Object's methods included.
        for (Class<?> level = type; level != null && seen.add(level); level = level.getSuperclass()) {
            level.getAnnotations();
            for (AccessibleObject member : level.getDeclaredMethods()) {
                member.getAnnotations();
            }
            for (Field field : level.getDeclaredFields()) {
                field.getAnnotations();
                if (field.isAnnotationPresent(Mixin.class) || field.isAnnotationPresent(ArgGroup.class)) {
                    read(partType(field), seen);
                }
            }
        }
    }

    /** The class of a mixin or argument group field: its type, or the element type of a list of groups. */
    private static Class<?> partType(Field field) {
        Type generic = field.getGenericType();
        if (generic instanceof ParameterizedType parameterized
                && parameterized.getActualTypeArguments()[0] instanceof Class<?> element) {
            return element;
        }
        return field.getType();
    }
}
