package dev.soakfield.mesh.msh;

import java.math.BigInteger;

/**
 * Correctly rounded w·10^q for a decimal significand w of up to 19 digits, with 128-bit truncated
 * powers of five: the algorithm of D. Lemire, "Number parsing at a gigabyte per second", Software:
 * Practice and Experience 51 (2021) 1700, as in its reference implementation fast_float (including
 * its round-half-even rule). Cases it cannot settle (subnormals, overflow, an ambiguous product)
 * report {@link Double#NaN} so the caller falls back to the JDK's parser.
 */
final class EiselLemire {
  private static final int SMALLEST_POWER = -342;
  private static final int LARGEST_POWER = 308;

  /** Top and next 64 bits of 5^q (q ≥ 0) or of 2^k / 5^-q (q < 0), normalized to bit 127. */
  private static final long[] HIGH = new long[LARGEST_POWER - SMALLEST_POWER + 1];

  private static final long[] LOW = new long[HIGH.length];

  static {
    BigInteger twoTo128 = BigInteger.ONE.shiftLeft(128);
    BigInteger twoTo127 = BigInteger.ONE.shiftLeft(127);
    for (int q = SMALLEST_POWER; q <= LARGEST_POWER; q++) {
      BigInteger c;
      if (q >= 0) {
        c = BigInteger.valueOf(5).pow(q);
        while (c.compareTo(twoTo127) < 0) {
          c = c.shiftLeft(1);
        }
        while (c.compareTo(twoTo128) >= 0) {
          c = c.shiftRight(1);
        }
      } else {
        BigInteger p5 = BigInteger.valueOf(5).pow(-q);
        int z = p5.bitLength(); // smallest z with 2^z >= p5, unless p5 is a power of two (never)
        int b = q >= -27 ? z + 127 : 2 * z + 128;
        c = BigInteger.ONE.shiftLeft(b).divide(p5).add(BigInteger.ONE);
        while (c.compareTo(twoTo128) >= 0) {
          c = c.shiftRight(1);
        }
      }
      HIGH[q - SMALLEST_POWER] = c.shiftRight(64).longValue();
      LOW[q - SMALLEST_POWER] = c.longValue();
    }
  }

  private EiselLemire() {}

  /** w·10^q as a double, or NaN when this method cannot decide and the caller must fall back. */
  static double toDouble(long w, int q, boolean negative) {
    if (w == 0) {
      return negative ? -0.0 : 0.0;
    }
    if (q < SMALLEST_POWER || q > LARGEST_POWER) {
      return Double.NaN;
    }
    int lz = Long.numberOfLeadingZeros(w);
    long x = w << lz;
    int index = q - SMALLEST_POWER;
    long hi = unsignedMultiplyHigh(x, HIGH[index]);
    long lo = x * HIGH[index];
    final long precisionMask = 0xFFFFFFFFFFFFFFFFL >>> 55;
    if ((hi & precisionMask) == precisionMask) {
      long secondHigh = unsignedMultiplyHigh(x, LOW[index]);
      lo += secondHigh;
      if (Long.compareUnsigned(secondHigh, lo) > 0) {
        hi++;
      }
      if ((hi & precisionMask) == precisionMask && lo == -1L) {
        return Double.NaN; // too close to call with 128 bits
      }
    }
    int upperBit = (int) (hi >>> 63);
    int shift = upperBit + 64 - 52 - 3;
    long mantissa = hi >>> shift;
    int power2 = (((152170 + 65536) * q) >> 16) + 63 + upperBit - lz + 1023;
    if (power2 <= 0) {
      return Double.NaN; // subnormal: leave to the JDK
    }
    if (Long.compareUnsigned(lo, 1) <= 0
        && q >= -4
        && q <= 23
        && (mantissa & 3) == 1
        && (mantissa << shift) == hi) {
      mantissa &= ~1L; // exactly halfway: round to even
    }
    mantissa += mantissa & 1;
    mantissa >>>= 1;
    if (mantissa >= (2L << 52)) {
      mantissa = 1L << 52;
      power2++;
    }
    mantissa &= ~(1L << 52);
    if (power2 >= 0x7FF) {
      return Double.NaN; // overflow: leave to the JDK
    }
    long bits = mantissa | ((long) power2 << 52) | (negative ? 1L << 63 : 0);
    return Double.longBitsToDouble(bits);
  }

  /**
   * High 64 bits of the unsigned 128-bit product (Math.unsignedMultiplyHigh arrived in Java 18).
   */
  private static long unsignedMultiplyHigh(long a, long b) {
    return Math.multiplyHigh(a, b) + ((a >> 63) & b) + ((b >> 63) & a);
  }
}
