package org.strandbook.scanfile;

/**
 * Checks a file's abscissae and turns them into Strandbook's ascending wavelength axis in nm.
 *
 * <p>The file may run up or down (analyzers in wavenumbers often write from high to low), but it
 * must run one way: a repeated abscissa or an axis that turns back is a damaged or concatenated
 * file, and importing it sorted would hide that.
 */
final class FileAxis {

    /** Ascending wavelengths and the values carried along with them. */
    record Ascending(double[] wavelengthsNm, double[] values) {
    }

    private FileAxis() {
    }

    /**
     * @param x     abscissae in file order and file unit
     * @param y     ordinates in file order
     * @param lines the 1-based file line of each point, for messages
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
                throw new SpectrumFileException(fileName, lines[i], "abscissa " + NumberField.plain(x[i]) + " "
                        + unit.symbol() + " is not positive: a " + (unit == XUnit.WAVENUMBER_CM ? "wavenumber" : "wavelength")
                        + " must be greater than zero");
            }
        }
        boolean ascending = x[1] > x[0];
        for (int i = 1; i < n; i++) {
            if (x[i] == x[i - 1]) {
                throw new SpectrumFileException(fileName, lines[i], "abscissa " + NumberField.plain(x[i]) + " "
                        + unit.symbol() + " repeats the point on line " + lines[i - 1]);
            }
            if ((x[i] > x[i - 1]) != ascending) {
                throw new SpectrumFileException(fileName, lines[i], "the axis turns back: " + NumberField.plain(x[i])
                        + " after " + NumberField.plain(x[i - 1]) + " " + unit.symbol() + " in "
                        + (ascending ? "an ascending" : "a descending") + " axis (rows must be sorted by abscissa)");
            }
        }
        double[] nm = new double[n];
        for (int i = 0; i < n; i++) {
            nm[i] = unit.toNm(x[i]);
            if (!Double.isFinite(nm[i])) {
                throw new SpectrumFileException(fileName, lines[i], "abscissa " + NumberField.plain(x[i]) + " "
                        + unit.symbol() + " is outside any wavelength range Strandbook can hold");
            }
        }
        double[] values = y.clone();
        int[] order = lines.clone();
        if (nm[n - 1] < nm[0]) {
            reverse(nm);
            reverse(values);
            reverse(order);
        }
        for (int i = 1; i < n; i++) {
            if (!(nm[i] > nm[i - 1])) {
                throw new SpectrumFileException(fileName, order[i], "abscissa on this line and on line " + order[i - 1]
                        + " give the same wavelength in nm (" + NumberField.plain(nm[i]) + ")");
            }
        }
        return new Ascending(nm, values);
    }

    private static void reverse(double[] a) {
        for (int i = 0, j = a.length - 1; i < j; i++, j--) {
            double t = a[i];
            a[i] = a[j];
            a[j] = t;
        }
    }

    private static void reverse(int[] a) {
        for (int i = 0, j = a.length - 1; i < j; i++, j--) {
            int t = a[i];
            a[i] = a[j];
            a[j] = t;
        }
    }
}
