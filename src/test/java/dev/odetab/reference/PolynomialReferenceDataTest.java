package dev.odetab.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import org.apache.commons.math3.fraction.BigFraction;
import org.junit.jupiter.api.Test;

/** The committed orthogonal-polynomial reference files are exactly what the generator writes today. */
class PolynomialReferenceDataTest {
    @Test
    void committedFilesMatchTheGenerator() throws Exception {
        assertEquals(PolynomialReferenceData.closedForms(), Files.readString(PolynomialReferenceData.CLOSED_FORMS, StandardCharsets.UTF_8));
        assertEquals(PolynomialReferenceData.commons(), Files.readString(PolynomialReferenceData.COMMONS, StandardCharsets.UTF_8));
    }

    @Test
    void decimalsAreExactOrFortyDigits() {
        assertEquals("0.3750000000000000000000000000000000000000", PolynomialReferenceData.decimal(new BigFraction(3, 8)));
        assertEquals("0.0000000000000000000000000000000000000000", PolynomialReferenceData.decimal(BigFraction.ZERO));
        assertEquals("0.3333333333333333333333333333333333333333", PolynomialReferenceData.decimal(new BigFraction(1, 3)));
        assertEquals("-30240.00000000000000000000000000000000000", PolynomialReferenceData.decimal(new BigFraction(-30240)));
    }

    @Test
    void coefficientGuardsRejectInexactDoubles() {
        assertEquals(new BigFraction(-35, 8), PolynomialReferenceData.dyadic(-35.0 / 8, 3, "-35/8"));
        assertThrows(IllegalStateException.class, () -> PolynomialReferenceData.dyadic(0.1, 12, "0.1"));
        assertThrows(IllegalStateException.class, () -> PolynomialReferenceData.dyadic(0.5, 0, "1/2 where integers are due"));
        assertEquals(new BigFraction(-7, 6), PolynomialReferenceData.overFactorial(-7.0 / 6, 3, "-7/6"));
        assertThrows(IllegalStateException.class, () -> PolynomialReferenceData.overFactorial(Math.nextUp(-7.0 / 6), 3, "off by one ulp"));
    }
}
