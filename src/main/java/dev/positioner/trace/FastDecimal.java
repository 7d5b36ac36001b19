package dev.positioner.trace;

/**
 * Parses the plain decimals that fill trace files ("-12.345") without the general machinery of
 * {@link Double#parseDouble}, which is most of the cost of reading a long trace. The result is
 * the same double: a mantissa below 2^53 and a power of ten up to 10^22 are both exact, and one
 * IEEE division of exact operands is correctly rounded (Clinger's fast path, "How to read
 * floating point numbers accurately", PLDI 1990). Anything else (exponents, long mantissas,
 * "NaN") goes to {@link Double#parseDouble}.
 */
final class FastDecimal {

    private static final double[] POW10 = new double[23];

    static {
        double p = 1;
        for (int i = 0; i < POW10.length; i++) {
            POW10[i] = p;
            p *= 10;
        }
    }

    private FastDecimal() {
    }

    static double parse(String s) {
        int n = s.length();
        int i = 0;
        boolean neg = false;
        if (n > 0 && (s.charAt(0) == '-' || s.charAt(0) == '+')) {
            neg = s.charAt(0) == '-';
            i = 1;
        }
        long mant = 0;
        int digits = 0;
        int frac = -1;
        for (; i < n; i++) {
            char c = s.charAt(i);
            if (c >= '0' && c <= '9') {
                if (++digits > 15) {
                    return Double.parseDouble(s);
                }
                mant = mant * 10 + (c - '0');
                if (frac >= 0) {
                    frac++;
                }
            } else if (c == '.' && frac < 0) {
                frac = 0;
            } else {
                return Double.parseDouble(s);
            }
        }
        if (digits == 0) {
            return Double.parseDouble(s); // throws for "", "-", "."
        }
        double v = frac > 0 ? mant / POW10[frac] : mant;
        return neg ? -v : v;
    }
}
