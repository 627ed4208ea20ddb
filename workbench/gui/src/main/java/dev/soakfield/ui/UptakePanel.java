package dev.soakfield.ui;

import static org.lwjgl.nuklear.Nuklear.*;

import dev.soakfield.app.Annotations;
import dev.soakfield.app.FaceGroupPalette;
import dev.soakfield.app.FieldKind;
import dev.soakfield.app.ProbeSelection;
import dev.soakfield.app.Resample;
import dev.soakfield.app.WorkbenchModel;
import dev.soakfield.fem.results.Series;
import dev.soakfield.fem.results.StoredRun;
import dev.soakfield.report.TimeAxis;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.lwjgl.nuklear.NkContext;
import org.lwjgl.system.MemoryStack;

/**
 * The "Uptake" panel on the right: what is under the cursor and was clicked, the amount per part
 * against time, and the probe's curve through the frames.
 */
final class UptakePanel {
  private final NkContext ctx;
  private final WorkbenchModel model;

  UptakePanel(NkContext ctx, WorkbenchModel model) {
    this.ctx = ctx;
    this.model = model;
  }

  void draw(MemoryStack stack) {
    ProbeSelection probe = model.probe();
    nk_layout_row_dynamic(ctx, 20, 1);
    nk_label(ctx, probe.hover().isEmpty() ? "(point at the part)" : probe.hover(), NK_TEXT_LEFT);
    probe.picked().ifPresent(p -> nk_label(ctx, "clicked: " + p, NK_TEXT_LEFT));
    Optional<Series> series = model.study().results().flatMap(StoredRun::series);
    if (series.isPresent() && series.get().rows() > 1 && series.get().has("time")) {
      amounts(stack, series.get());
    }
    if (probe.probe().isPresent()) {
      probe(probe);
    }
  }

  private void amounts(MemoryStack stack, Series s) {
    double[] t = s.require("time");
    TimeAxis axis = TimeAxis.forEnd(t[t.length - 1]);
    List<String> parts = s.suffixes("amount:");
    double[] x = new double[60];
    for (int i = 0; i < x.length; i++) {
      x[i] = t[t.length - 1] * i / (x.length - 1.0) / axis.seconds();
    }
    List<double[]> curves = new ArrayList<>();
    int[] colours = new int[parts.size()];
    for (int i = 0; i < parts.size(); i++) {
      curves.add(Resample.even(t, s.require("amount:" + parts.get(i)), x.length));
      colours[i] = FaceGroupPalette.colourOf(i);
    }
    nk_layout_row_dynamic(ctx, 20, 1);
    nk_label(ctx, "Amount per part against time", NK_TEXT_LEFT);
    String amount = model.study().results().map(r -> r.units().amount()).orElse("c*m^3");
    AxesPlot.draw(
        ctx, 190, x, curves, colours, "time [" + axis.unit() + "]", "amount [" + amount + "]");
    nk_layout_row_dynamic(ctx, 18, 1);
    for (int i = 0; i < parts.size(); i++) {
      nk_label_colored(
          ctx,
          parts.get(i) + "  (max " + Annotations.number(max(curves.get(i))) + ")",
          NK_TEXT_LEFT,
          NkCharts.colour(stack, i));
    }
  }

  private void probe(ProbeSelection probe) {
    double[] p = probe.probe().get().point();
    nk_layout_row_dynamic(ctx, 20, 1);
    nk_label(ctx, "Probe", NK_TEXT_LEFT);
    nk_label(
        ctx,
        String.format(
            Locale.ROOT,
            "at %s, %s, %s",
            Annotations.length(p[0]),
            Annotations.length(p[1]),
            Annotations.length(p[2])),
        NK_TEXT_LEFT);
    if (probe.curve().isPresent()) {
      double[] v = probe.curve().get();
      double lo = Double.POSITIVE_INFINITY;
      double hi = Double.NEGATIVE_INFINITY;
      for (double x : v) {
        lo = Math.min(lo, x);
        hi = Math.max(hi, x);
      }
      nk_label(
          ctx,
          "range " + Annotations.number(lo) + " .. " + Annotations.number(hi) + " over the frames",
          NK_TEXT_LEFT);
      StoredRun r = model.study().results().orElseThrow();
      double[] times = new double[v.length];
      TimeAxis axis = TimeAxis.forEnd(r.time(v.length - 1));
      for (int f = 0; f < v.length; f++) {
        times[f] = r.time(f) / axis.seconds();
      }
      AxesPlot.draw(
          ctx,
          150,
          times,
          List.of(v),
          new int[] {0xe8c45a},
          "time [" + axis.unit() + "] (the frames)",
          model.settings().field().map(k -> k.words).orElse("value")
              + (FieldKind.CONCENTRATION.equals(model.settings().field().orElse(null))
                  ? " [" + r.units().concentration() + "]"
                  : ""));
    }
  }

  private static double max(double[] v) {
    double m = Double.NEGATIVE_INFINITY;
    for (double x : v) {
      m = Math.max(m, x);
    }
    return m;
  }
}
