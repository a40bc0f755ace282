package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class Sha256Test {

    @Test
    void matchesTheFips180ExampleForAbc() {
        // FIPS 180-4 (NIST, 2015), SHA-256 example "abc", as published in NIST's example values.
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad", Sha256.hex("abc"));
    }

    @Test
    void matchesTheFips180ExampleForTheTwoBlockMessage() {
        // FIPS 180-4 example, 448-bit message "abcdbcde...nopq".
        assertEquals("248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1",
                Sha256.hex("abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq"));
    }

    @Test
    void digestsMadeOneAfterAnotherKeepTheirOwnState() {
        // FIPS 180-4 example "abc" again, fed to two digests in interleaved pieces
        java.security.MessageDigest first = Sha256.newDigest();
        first.update((byte) 'a');
        java.security.MessageDigest second = Sha256.newDigest();
        second.update(new byte[] {'a', 'b', 'c'});
        first.update(new byte[] {'b', 'c'});
        String abc = "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad";
        assertEquals(abc, Sha256.toHex(second.digest()));
        assertEquals(abc, Sha256.toHex(first.digest()));
    }

    @Test
    void normalisesCaseAndRefusesAnythingButSixtyFourHexDigits() {
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
                Sha256.normalized(" BA7816BF8F01CFEA414140DE5DAE2223B00361A396177A9CB410FF61F20015AD ", "f"));
        assertThrows(IllegalArgumentException.class, () -> Sha256.normalized("ba7816bf", "f"));
    }

    @Test
    void fieldsAreDigestedLengthPrefixedWithADashForNull() throws Exception {
        // the trail's documented field encoding, digested by the JDK's own SHA-256 (FIPS 180-4) as reference
        String expected = Sha256.toHex(java.security.MessageDigest.getInstance("SHA-256")
                .digest("3:abc-6:µm·s".getBytes(java.nio.charset.StandardCharsets.UTF_8)));
        assertEquals(expected, new Sha256.Fields().add("abc").add(null).add("µm·s").hex());
    }

    @Test
    void aFieldLongerThanTheBufferIsDigestedWhole() throws Exception {
        // a 2,000-character JSON image outgrows the first buffer; the JDK's SHA-256 is the reference
        String big = "x".repeat(2000);
        String expected = Sha256.toHex(java.security.MessageDigest.getInstance("SHA-256")
                .digest(("2000:" + big).getBytes(java.nio.charset.StandardCharsets.UTF_8)));
        assertEquals(expected, new Sha256.Fields().add(big).hex());
    }
}
