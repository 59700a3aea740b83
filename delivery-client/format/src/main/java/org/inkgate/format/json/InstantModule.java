package org.inkgate.format.json;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.databind.DeserializationContext;
import com.fasterxml.jackson.databind.SerializerProvider;
import com.fasterxml.jackson.databind.deser.std.StdDeserializer;
import com.fasterxml.jackson.databind.module.SimpleModule;
import com.fasterxml.jackson.databind.ser.std.StdSerializer;
import com.fasterxml.jackson.datatype.jsr310.deser.InstantDeserializer;
import java.io.IOException;
import java.time.Instant;

/**
 * Writes and reads {@link Instant}s through {@link InstantText}, registered after the Java time module so
 * that it takes over that module's {@code Instant} handling: the same text written (ISO 8601 in UTC,
 * {@code WRITE_DATES_AS_TIMESTAMPS} being off in {@link Json}), and for reading the writer's own form is
 * counted out while any other form goes to the time module's own reader, so exactly the same values are
 * accepted and refused as before ({@code InstantModuleTest}).
 */
final class InstantModule extends SimpleModule {

    private static final long serialVersionUID = 1L;

    InstantModule() {
        super("inkgate-instants");
        addSerializer(Instant.class, new Writer());
        addDeserializer(Instant.class, new Reader());
    }

    private static final class Writer extends StdSerializer<Instant> {

        private static final long serialVersionUID = 1L;

        Writer() {
            super(Instant.class);
        }

        @Override
        public void serialize(Instant value, JsonGenerator gen, SerializerProvider provider) throws IOException {
            gen.writeString(InstantText.text(value));
        }
    }

    private static final class Reader extends StdDeserializer<Instant> {

        private static final long serialVersionUID = 1L;

        Reader() {
            super(Instant.class);
        }

        @Override
        public Instant deserialize(JsonParser p, DeserializationContext ctxt) throws IOException {
            if (p.currentToken() == JsonToken.VALUE_STRING) {
                Instant fast = InstantText.parse(p.getText());
                if (fast != null) {
                    return fast;
                }
            }
            // the reader the time module registers for Instant: it decides every other form, as before
            return InstantDeserializer.INSTANT.deserialize(p, ctxt);
        }
    }
}
