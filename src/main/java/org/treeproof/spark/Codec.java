package org.treeproof.spark;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.ObjectInputStream;
import java.io.ObjectOutputStream;
import java.io.ObjectStreamClass;
import java.io.UncheckedIOException;

/**
 * Java serialization to and from bytes. Tasks and results cross Spark as plain {@code byte[]}, so they travel the
 * same way whatever {@code spark.serializer} a cluster is configured with (Kryo would otherwise copy objects field
 * by field and skip the serial forms that, for instance, keep the n² distances out of a shipped task).
 */
final class Codec {
    private Codec() {
    }

    static byte[] encode(Object value) {
        var bytes = new ByteArrayOutputStream();
        try (var out = new ObjectOutputStream(bytes)) {
            out.writeObject(value);
        } catch (IOException e) {
            throw new UncheckedIOException("could not serialize " + value.getClass().getName(), e);
        }
        return bytes.toByteArray();
    }

    static Object decode(byte[] bytes) {
        try (var in = new ContextObjectInputStream(new ByteArrayInputStream(bytes))) {
            return in.readObject();
        } catch (IOException e) {
            throw new UncheckedIOException("could not deserialize a shipped object", e);
        } catch (ClassNotFoundException e) {
            throw new IllegalStateException("a shipped class is missing on this machine: " + e.getMessage(), e);
        }
    }

    /**
     * Resolves classes through the thread's context class loader first: on an executor that is the loader Spark
     * gives the application jar, which need not be the one that loaded this class.
     */
    private static final class ContextObjectInputStream extends ObjectInputStream {
        ContextObjectInputStream(InputStream in) throws IOException {
            super(in);
        }

        @Override
        protected Class<?> resolveClass(ObjectStreamClass desc) throws IOException, ClassNotFoundException {
            ClassLoader loader = Thread.currentThread().getContextClassLoader();
            if (loader != null) {
                try {
                    return Class.forName(desc.getName(), false, loader);
                } catch (ClassNotFoundException e) {
                    // fall through to the default resolution (primitives, classes of this loader)
                }
            }
            return super.resolveClass(desc);
        }
    }
}
