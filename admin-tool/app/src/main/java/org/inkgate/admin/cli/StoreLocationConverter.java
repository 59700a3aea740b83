package org.inkgate.admin.cli;

import org.inkgate.admin.core.store.StoreException;
import org.inkgate.admin.core.store.StoreLocation;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/** Reads {@code --store}: a store file or a PostgreSQL URL; anything else is refused with what to give instead. */
final class StoreLocationConverter implements ITypeConverter<StoreLocation> {

    @Override
    public StoreLocation convert(String value) {
        try {
            return StoreLocation.parse(value);
        } catch (StoreException e) {
            throw new TypeConversionException(e.getMessage());
        }
    }
}
