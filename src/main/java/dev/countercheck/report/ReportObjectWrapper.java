package dev.countercheck.report;

import freemarker.ext.util.WrapperTemplateModel;
import freemarker.template.AdapterTemplateModel;
import freemarker.template.DefaultListAdapter;
import freemarker.template.DefaultObjectWrapper;
import freemarker.template.SimpleScalar;
import freemarker.template.TemplateBooleanModel;
import freemarker.template.TemplateHashModel;
import freemarker.template.TemplateModel;
import freemarker.template.TemplateModelException;
import freemarker.template.Version;

import java.lang.invoke.LambdaMetafactory;
import java.lang.invoke.MethodHandle;
import java.lang.invoke.MethodHandles;
import java.lang.invoke.MethodType;
import java.lang.reflect.Method;
import java.lang.reflect.Modifier;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;

/**
 * Freemarker's default object wrapper, with a short path for the records the report's templates read
 * ({@link HtmlModel}'s views, {@link Paging}, the index's rows), which the template reads many times per step of
 * every calculation. A record's value is read by its name, as the default wrapper reads it, but through a table
 * made once per record class (each public method without arguments that returns something, called directly
 * rather than by reflection) and wrapped by its declared type as the default wrapper would wrap it (text, flag,
 * list, record), instead of the wrapper's general introspection and type tests on every read. Anything else a
 * template asks of a record (a method with arguments, such as {@code href(anchor)}) goes to the default wrapper's
 * own model of it, as does every value that is not a record.
 */
final class ReportObjectWrapper extends DefaultObjectWrapper {

    /** What a value is, by its method's declared type: how it is wrapped. */
    private enum Kind { TEXT, FLAG, LIST, RECORD, OTHER }

    private record Value(Function<Object, Object> read, Kind kind) {
    }

    /** The values each record class exposes by name. */
    private static final ClassValue<Map<String, Value>> VALUES = new ClassValue<>() {
        @Override
        protected Map<String, Value> computeValue(Class<?> type) {
            Map<String, Value> values = new HashMap<>();
            for (Method m : type.getMethods()) {
                if (!Modifier.isStatic(m.getModifiers()) && m.getParameterCount() == 0
                        && m.getReturnType() != void.class && m.getDeclaringClass() != Object.class
                        && !m.getName().equals("hashCode") && !m.getName().equals("toString")) {
                    reader(m).ifPresent(read -> values.put(m.getName(), new Value(read, kind(m.getReturnType()))));
                }
            }
            return Map.copyOf(values);
        }
    };

    ReportObjectWrapper(Version version) {
        super(version);
        if (!getUseAdaptersForContainers()) {
            throw new IllegalStateException("the report's templates read lists through the wrapper's adapters");
        }
        writeProtect();
    }

    @Override
    protected TemplateModel handleUnknownType(Object object) throws TemplateModelException {
        return object instanceof Record ? new RecordModel(object) : super.handleUnknownType(object);
    }

    private static Kind kind(Class<?> type) {
        if (type == String.class) {
            return Kind.TEXT;
        }
        if (type == boolean.class) {
            return Kind.FLAG;
        }
        if (List.class.isAssignableFrom(type)) {
            return Kind.LIST;
        }
        return Record.class.isAssignableFrom(type) ? Kind.RECORD : Kind.OTHER;
    }

    /** A direct call of {@code method} (no reflection per call), or none when it cannot be made (then the default). */
    @SuppressWarnings("unchecked")
    private static Optional<Function<Object, Object>> reader(Method method) {
        try {
            MethodHandles.Lookup lookup = MethodHandles.lookup();
            MethodHandle target = lookup.unreflect(method);
            return java.util.Optional.of((Function<Object, Object>) LambdaMetafactory.metafactory(lookup, "apply",
                    MethodType.methodType(Function.class), MethodType.methodType(Object.class, Object.class), target,
                    target.type().wrap()).getTarget().invokeExact());
        } catch (Throwable e) {
            return java.util.Optional.empty();
        }
    }

    /** A record as the template reads it. */
    private final class RecordModel implements TemplateHashModel, AdapterTemplateModel, WrapperTemplateModel {

        private final Object record;
        private final Map<String, Value> values;
        private TemplateHashModel general;

        RecordModel(Object record) {
            this.record = record;
            this.values = VALUES.get(record.getClass());
        }

        @Override
        public TemplateModel get(String key) throws TemplateModelException {
            Value value = values.get(key);
            if (value == null) {
                return general().get(key);
            }
            Object result = value.read().apply(record);
            if (result == null) {
                return wrap(null);
            }
            return switch (value.kind()) {
                case TEXT -> new SimpleScalar((String) result);
                case FLAG -> (Boolean) result ? TemplateBooleanModel.TRUE : TemplateBooleanModel.FALSE;
                case LIST -> DefaultListAdapter.adapt((List<?>) result, ReportObjectWrapper.this);
                case RECORD -> new RecordModel(result);
                case OTHER -> wrap(result);
            };
        }

        /** The default wrapper's model of the record, for what the table does not hold. */
        private TemplateHashModel general() throws TemplateModelException {
            if (general == null) {
                general = (TemplateHashModel) ReportObjectWrapper.super.handleUnknownType(record);
            }
            return general;
        }

        @Override
        public boolean isEmpty() {
            return false;
        }

        @Override
        public Object getAdaptedObject(Class<?> hint) {
            return record;
        }

        @Override
        public Object getWrappedObject() {
            return record;
        }
    }
}
