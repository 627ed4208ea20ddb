package dev.soakfield.mesh.msh;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.charset.StandardCharsets;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class DecimalParserTest {
  private static double parse(String s) {
    byte[] b = (" " + s + " ").getBytes(StandardCharsets.US_ASCII);
    return DecimalParser.parse(b, 1, b.length - 1);
  }

  private static void assertBits(double expected, double actual) {
    assertEquals(Double.doubleToRawLongBits(expected), Double.doubleToRawLongBits(actual));
  }

  @Test
  void everyDoubleToStringFormReadsBackBitForBit() {
    // Java SE API, Double.toString: enough digits to tell the value from its neighbours
    SplittableRandom rnd = new SplittableRandom(20240601L);
    for (int i = 0; i < 200_000; i++) {
      double v = Double.longBitsToDouble(rnd.nextLong());
      if (!Double.isFinite(v)) {
        continue;
      }
      assertBits(v, parse(Double.toString(v)));
      double plain = rnd.nextInt(2_000_000) / 1000.0 - 1000;
      assertBits(plain, parse(Double.toString(plain)));
    }
  }

  @Test
  void longDecimalsMatchTheJdkParserAcrossTheExponentRange() {
    // reference: the JDK's Double.parseDouble, correctly rounded per the Java SE API
    SplittableRandom rnd = new SplittableRandom(99L);
    for (int i = 0; i < 200_000; i++) {
      int digits = 16 + rnd.nextInt(4);
      StringBuilder sb = new StringBuilder(rnd.nextBoolean() ? "-" : "");
      sb.append((char) ('1' + rnd.nextInt(9)));
      sb.append('.');
      for (int d = 1; d < digits; d++) {
        sb.append((char) ('0' + rnd.nextInt(10)));
      }
      sb.append('e').append(rnd.nextInt(-330, 309));
      String text = sb.toString();
      assertBits(Double.parseDouble(text), parse(text));
    }
  }

  @Test
  void halfwayCasesRoundToEven() {
    // 2^53 + 1 and 2^53 + 3 lie exactly between two doubles (IEEE 754 round half to even)
    assertBits(9007199254740992.0, parse("9007199254740993"));
    assertBits(9007199254740996.0, parse("9007199254740995"));
    assertBits(Double.parseDouble("1.7976931348623157e308"), parse("1.7976931348623157e308"));
    assertBits(Double.parseDouble("4.9e-324"), parse("4.9e-324"));
    assertBits(Double.parseDouble("2.2250738585072014e-308"), parse("2.2250738585072014e-308"));
  }

  @Test
  void plainDecimalsMatchTheJdkParser() {
    String[] samples = {
      "0",
      "-0",
      "1",
      "0.1",
      "0.3",
      "-2.5",
      "123456789012345",
      "0.000000000000001",
      "1e22",
      "1e-22",
      "1e23",
      "9007199254740993",
      "12345678901234567890",
      "4.9e-324",
      "1.7976931348623157e308",
      "2.2250738585072014E-308",
      ".5",
      "5.",
      "+7.25e+2",
      "0.1e1",
      "10E-1",
      "3.141592653589793"
    };
    for (String s : samples) {
      assertBits(Double.parseDouble(s), parse(s));
    }
  }

  @Test
  void negativeZeroKeepsItsSign() {
    assertBits(-0.0, parse("-0.000"));
  }

  @Test
  void malformedNumbersAreRefused() {
    for (String s :
        new String[] {"", "-", ".", "1.2.3", "1e", "1e+", "0x10", "NaN", "inf", "1,5"}) {
      assertThrows(NumberFormatException.class, () -> parse(s), s);
    }
  }
}
