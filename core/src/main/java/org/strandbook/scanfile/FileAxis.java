package org.strandbook.scanfile;

/**
 * Checks a file's abscissae and turns them into Strandbook's ascending wavelength axis in nm.
 *
 * <p>The file may run up or down (analyzers in wavenumbers often write from high to low), but it
 * must run one way: a repeated abscissa or an axis that turns back is a damaged or concatenated
 * file, and importing it sorted would hide that.
 *
 * <p>The arrays handed in are the reader's own scratch: they are converted and turned in place,
 * since every file of a batch import passes through here and copies would only feed the garbage
 * collector. Messages are built in separate methods that run only on a bad file.
 */
final class FileAxis {

    /** Ascending wavelengths and the values carried along with them. */
    record Ascending(double[] wavelengthsNm, double[] values) {
    }

    /**
     * The widest wavelength range a light spectrum from a fiber-coupled analyzer can span, 100 nm
     * (vacuum UV) to 100 µm (far infrared): silica, sapphire and chalcogenide fibers all transmit
     * well inside it. An axis outside it is a wrong unit (µm written over values in nm) or no light
     * at all [design choice].
     */
    static final double MIN_LIGHT_NM = 100;
    static final double MAX_LIGHT_NM = 100_000;

    private FileAxis() {
    }

    /**
     * @param x     abscissae in file order and file unit; becomes the wavelengths (nm), ascending
     * @param y     ordinates in file order; becomes the values in wavelength order
     * @param lines the 1-based file line of each point, for messages; not changed
     */
    static Ascending toAscendingNm(String fileName, XUnit unit, double[] x, double[] y, int[] lines)
            throws SpectrumFileException {
        int n = x.length;
        if (n < SpectrumFile.MIN_POINTS) {
            throw new SpectrumFileException(fileName, n == 0 ? 0 : lines[n - 1], "only " + n
                    + " data point" + (n == 1 ? "" : "s") + ": a spectrum needs at least " + SpectrumFile.MIN_POINTS);
        }
        for (int i = 0; i < n; i++) {
            if (!(x[i] > 0)) {
                throw notPositive(fileName, unit, x[i], lines[i]);
            }
        }
        boolean ascending = x[1] > x[0];
        for (int i = 1; i < n; i++) {
            if (x[i] == x[i - 1] || (x[i] > x[i - 1]) != ascending) {
                throw outOfOrder(fileName, unit, x, lines, i, ascending);
            }
        }
        for (int i = 0; i < n; i++) {
            double nm = unit.toNm(x[i]);
            if (!Double.isFinite(nm)) {
                throw outOfRange(fileName, unit, x[i], lines[i]);
            }
            if (nm < MIN_LIGHT_NM || nm > MAX_LIGHT_NM) {
                throw implausible(fileName, unit, x[i], lines[i]);
            }
            x[i] = nm;
        }
        boolean reversed = x[n - 1] < x[0];
        if (reversed) {
            reverse(x);
            reverse(y);
        }
        for (int i = 1; i < n; i++) {
            if (!(x[i] > x[i - 1])) {
                int line = lines[reversed ? n - 1 - i : i];
                int previousLine = lines[reversed ? n - i : i - 1];
                throw new SpectrumFileException(fileName, line, "abscissa on this line and on line " + previousLine
                        + " give the same wavelength in nm (" + NumberField.plain(x[i]) + ")");
            }
        }
        return new Ascending(x, y);
    }

    private static SpectrumFileException notPositive(String fileName, XUnit unit, double x, int line) {
        return new SpectrumFileException(fileName, line, "abscissa " + NumberField.plain(x) + " "
                + unit.symbol() + " is not positive: a " + (unit == XUnit.WAVENUMBER_CM ? "wavenumber" : "wavelength")
                + " must be greater than zero");
    }

    private static SpectrumFileException outOfOrder(String fileName, XUnit unit, double[] x, int[] lines, int i,
                                                    boolean ascending) {
        if (x[i] == x[i - 1]) {
            return new SpectrumFileException(fileName, lines[i], "abscissa " + NumberField.plain(x[i]) + " "
                    + unit.symbol() + " repeats the point on line " + lines[i - 1]);
        }
        return new SpectrumFileException(fileName, lines[i], "the axis turns back: " + NumberField.plain(x[i])
                + " after " + NumberField.plain(x[i - 1]) + " " + unit.symbol() + " in "
                + (ascending ? "an ascending" : "a descending") + " axis (rows must be sorted by abscissa)");
    }

    private static SpectrumFileException outOfRange(String fileName, XUnit unit, double x, int line) {
        return new SpectrumFileException(fileName, line, "abscissa " + NumberField.plain(x) + " "
                + unit.symbol() + " is outside any wavelength range Strandbook can hold");
    }

    private static SpectrumFileException implausible(String fileName, XUnit unit, double x, int line) {
        double low = Math.min(unit.fromNm(MIN_LIGHT_NM), unit.fromNm(MAX_LIGHT_NM));
        double high = Math.max(unit.fromNm(MIN_LIGHT_NM), unit.fromNm(MAX_LIGHT_NM));
        return new SpectrumFileException(fileName, line, "abscissa " + NumberField.plain(x) + " in the declared unit "
                + unit.symbol() + " lies outside " + NumberField.plain(low) + "–" + NumberField.plain(high) + " "
                + unit.symbol() + ", where light spectra lie in that unit (" + (int) MIN_LIGHT_NM + " nm to "
                + (int) (MAX_LIGHT_NM / 1000) + " µm): the unit named in the file does not fit its values");
    }

    private static void reverse(double[] a) {
        for (int i = 0, j = a.length - 1; i < j; i++, j--) {
            double t = a[i];
            a[i] = a[j];
            a[j] = t;
        }
    }
}
