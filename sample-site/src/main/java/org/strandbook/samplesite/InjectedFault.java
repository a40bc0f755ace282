package org.strandbook.samplesite;

/**
 * What the generator did to a point, for checking a diagnosis against.
 *
 * @param fault      the fault
 * @param element    the spoiled element's label on site, or empty
 * @param sizeDb     the injected excess loss at {@code atNm} at the last visit, dB (∞ for a break); for a
 *                   healthy point, what its joints lose above their records in all, within their spread
 * @param atNm       where {@code sizeDb} is stated, nm (NaN for wavelength-flat faults)
 */
public record InjectedFault(DemoPlant.Fault fault, String element, double sizeDb, double atNm) {
}
