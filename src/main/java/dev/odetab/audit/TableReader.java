package dev.odetab.audit;

import dev.odetab.base.InputError;
import dev.odetab.numeric.Format;
import dev.odetab.tables.Grid;
import dev.odetab.tables.TableDef;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

/**
 * Reads a foreign table: {@code .csv} files by {@link CsvReader}, anything else as C or Java
 * source by {@link ArrayReader}.
 *
 * <p>Trust level: Exact (the values held, see {@link Held}).
 */
public final class TableReader {
    private TableReader() {
    }

    /** Exact: the entries of {@code column} (CSV column or array name) of the file, for table {@code t}. */
    public static Entries read(Path file, String column, TableDef t) throws InputError {
        String display = file.toString();
        String text;
        try {
            if (Files.exists(file) && !Files.isRegularFile(file)) {
                throw new InputError(display, "not a regular file (a FIFO, a device or a folder): audit reads a table from a file");
            }
            text = new String(Files.readAllBytes(file), StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            throw new InputError(display, "no such file");
        } catch (IOException e) {
            throw new InputError(display, "cannot read the file: " + e.getMessage());
        }
        if (display.toLowerCase(Locale.ROOT).endsWith(".csv")) {
            return CsvReader.read(display, text, column, t.format(), t.kind().givenPoints().map(Grid::points).orElse(List.of()));
        }
        boolean arrays = switch (t.format().kind()) {
            case DOUBLE_DOUBLE -> false;
            case BINARY -> !t.format().equals(Format.BinaryFormat.BINARY128);
            case DECIMAL, FIXED -> true;
        };
        if (!arrays) {
            throw new InputError(display, "double-double and binary128 tables are audited from CSV files only");
        }
        return ArrayReader.read(display, text, column, t.format());
    }
}
