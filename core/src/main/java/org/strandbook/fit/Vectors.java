package org.strandbook.fit;

/** Dot products and norms of the short dense vectors the fit works with. */
final class Vectors {

    private Vectors() {
    }

    static double dot(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s += a[i] * b[i];
        }
        return s;
    }

    /** Euclidean norm, scaled so that very large or small entries neither overflow nor underflow. */
    static double norm(double[] a) {
        double scale = 0;
        for (double v : a) {
            scale = Math.max(scale, Math.abs(v));
        }
        if (scale == 0) {
            return 0;
        }
        double s = 0;
        for (double v : a) {
            double q = v / scale;
            s += q * q;
        }
        return scale * Math.sqrt(s);
    }
}
