package dev.soakfield.fem.results;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SeriesTest {
  @TempDir Path dir;

  @Test
  void quotedCellsFollowRfc4180() {
    // RFC 4180, section 2, rules 6 and 7: commas inside quotes, a doubled quote for a quote
    assertEquals(List.of("a", "b,c", "d\"e", ""), Series.split("a,\"b,c\",\"d\"\"e\","));
  }

  @Test
  void columnsAreFoundByNameWhateverTheirOrderOrNumber() throws IOException {
    Path f =
        Files.writeString(
            dir.resolve("series.csv"),
            "time,new_column,amount,probe:core\n0,7,0,\n10,8,0.5,0.25\n20,9,0.75,0.5\n");
    Series s = Series.read(f);
    assertArrayEquals(new double[] {0, 0.5, 0.75}, s.column("amount").orElseThrow());
    assertEquals(List.of("core"), s.suffixes("probe:"));
    assertTrue(Double.isNaN(s.column("probe:core").orElseThrow()[0]), "an empty cell");
    assertEquals(0.5, s.last("probe:core"));
    assertEquals(9.0, s.max("new_column"));
    assertTrue(s.column("absent").isEmpty());
  }

  @Test
  void aRowThatDoesNotFitTheHeaderNamesItsLine() throws IOException {
    Path f = Files.writeString(dir.resolve("series.csv"), "time,amount\n0,0\n1\n");
    ResultFolderException e = assertThrows(ResultFolderException.class, () -> Series.read(f));
    assertTrue(e.getMessage().contains("line 3: found 1 cells, expected 2"), e.getMessage());
  }

  @Test
  void aCellThatIsNoNumberNamesItsLineAndColumn() throws IOException {
    Path f = Files.writeString(dir.resolve("series.csv"), "time,amount\n0,0\n1,0.5kg\n");
    ResultFolderException e = assertThrows(ResultFolderException.class, () -> Series.read(f));
    assertTrue(
        e.getMessage().endsWith("line 3, column 'amount': found '0.5kg', expected a number"),
        e.getMessage());
  }

  @Test
  void aMissingColumnThatACallerNeedsNamesTheColumnsThere() throws IOException {
    Path f = Files.writeString(dir.resolve("series.csv"), "time,amount\n0,0\n");
    ResultFolderException e =
        assertThrows(ResultFolderException.class, () -> Series.read(f).require("temperature"));
    assertTrue(e.getMessage().contains("no column 'temperature'"), e.getMessage());
    assertTrue(e.getMessage().contains("[time, amount]"), e.getMessage());
  }

  @Test
  void aCopyWithUnitsNamesEachColumnsUnitAndKeepsTheRows() throws IOException {
    Path f =
        Files.writeString(
            dir.resolve("series.csv"),
            """
            time,amount,amount:body,probe:core,inflow_rate:xmin,new_column
            0,0,0,0,0,1
            10,0.5,0.5,0.25,0.05,2
            """);
    Path csv = dir.resolve("out.csv");
    assertEquals(2, Series.copyWithUnits(f, csv));
    List<String> lines = Files.readAllLines(csv);
    assertEquals(
        "time [s],amount [c*m^3],amount:body [c*m^3],probe:core [c],"
            + "inflow_rate:xmin [c*m^3/s],new_column",
        lines.get(0));
    assertEquals("10,0.5,0.5,0.25,0.05,2", lines.get(2));
  }

  @Test
  void aCopyOfASeriesWithABadCellIsRefusedBeforeAnythingIsWritten() throws IOException {
    Path f = Files.writeString(dir.resolve("series.csv"), "time,amount\n0,zero\n");
    Path csv = dir.resolve("out.csv");
    assertThrows(ResultFolderException.class, () -> Series.copyWithUnits(f, csv));
    assertTrue(Files.notExists(csv));
  }

  @Test
  void summaryAndCaseCopyReadAsMissingWhenAbsentOrBroken() throws IOException {
    assertTrue(SummaryFile.readOrMissing(dir).isMissingNode());
    Files.writeString(dir.resolve(ResultFiles.SUMMARY), "{ broken");
    assertTrue(SummaryFile.readOrMissing(dir).isMissingNode());
    SummaryFile.write(dir, java.util.Map.of("law", "plain"));
    assertEquals("plain", SummaryFile.readOrMissing(dir).path("law").asText());
    Files.writeString(dir.resolve(ResultFiles.CASE_COPY), "{ // a comment\n \"initial\": 0.5 }");
    assertEquals(0.5, SummaryFile.caseCopyOrMissing(dir).path("initial").asDouble());
  }
}
