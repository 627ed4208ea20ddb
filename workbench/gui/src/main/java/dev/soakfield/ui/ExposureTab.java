package dev.soakfield.ui;

import static org.lwjgl.nuklear.Nuklear.*;

import com.fasterxml.jackson.databind.JsonNode;
import dev.soakfield.app.Annotations;
import dev.soakfield.app.setup.CaseDraft;
import dev.soakfield.app.setup.CaseValues;
import dev.soakfield.app.setup.DraftCheck;
import dev.soakfield.app.setup.ExposureEdits;
import dev.soakfield.app.setup.SetupSession;
import dev.soakfield.app.setup.TreePath;
import dev.soakfield.report.TimeAxis;
import java.util.List;
import java.util.Optional;
import java.util.function.Supplier;

/**
 * The "Exposure" tab: the sorption law and the history's segments (duration, temperature, humidity
 * or pressure; "a -> b" makes a ramp) and repeat blocks, with a plot of the temperature.
 */
final class ExposureTab extends SetupTab {
  private String repeatCount = "2";
  private String repeatTimes = "3";

  ExposureTab(Widgets w, Supplier<SetupSession> session) {
    super(w, session);
  }

  @Override
  void draw(SetupSession s, CaseDraft d) {
    var ctx = w.ctx();
    nk_layout_row_dynamic(ctx, 20, 1);
    ExposureEdits env = new ExposureEdits(d);
    nk_label(ctx, "Law: how the potential relates to the environment", NK_TEXT_LEFT);
    nk_layout_row_dynamic(ctx, 20, 3);
    for (String law : ExposureEdits.LAWS) {
      w.place("law " + law);
      if (nk_option_label(ctx, law, law.equals(env.law())) && !law.equals(env.law())) {
        env.law(law);
      }
    }
    boolean sieverts = env.law().equals("sieverts");
    nk_layout_row_dynamic(ctx, 20, 1);
    nk_label(
        ctx,
        "Segments: duration, temperature, " + (sieverts ? "pressure" : "humidity (0..1)"),
        NK_TEXT_LEFT);
    JsonNode list = env.segments();
    for (int i = 0; i < list.size(); i++) {
      JsonNode item = list.get(i);
      TreePath at = TreePath.of("exposure", i);
      if (item.has("repeat")) {
        nk_layout_row_dynamic(ctx, 22, 3);
        nk_label(ctx, "repeat ×", NK_TEXT_LEFT);
        w.field(at + " repeat", CaseValues.text(item.path("repeat")))
            .ifPresent(t -> d.set(at.child("repeat"), t));
        if (w.button("remove " + at, "remove")) {
          env.remove(at);
        }
        JsonNode inner = item.path("segments");
        for (int j = 0; j < inner.size(); j++) {
          segment(d, env, at.child("segments").child(j), inner.get(j), sieverts);
        }
      } else {
        segment(d, env, at, item, sieverts);
      }
    }
    nk_layout_row_dynamic(ctx, 22, 1);
    if (w.button("add segment")) {
      env.addSegment(TreePath.of("exposure"));
    }
    nk_layout_row_dynamic(ctx, 22, 3);
    w.field("repeat count", repeatCount).ifPresent(t -> repeatCount = t);
    w.field("repeat times", repeatTimes).ifPresent(t -> repeatTimes = t);
    if (w.button("repeat last")) {
      try {
        env.repeatLast(
            Integer.parseInt(repeatCount.strip()), Integer.parseInt(repeatTimes.strip()));
      } catch (NumberFormatException e) {
        repeatCount = "2"; // the field shows a whole number again
      }
    }
    Optional<DraftCheck> check = s.check();
    check.ifPresent(c -> w.problems(c.about(TreePath.of("exposure"))));
    check.flatMap(c -> c.temperatureCurve(60)).ifPresent(this::plot);
  }

  private void segment(
      CaseDraft d, ExposureEdits env, TreePath at, JsonNode seg, boolean sieverts) {
    var ctx = w.ctx();
    String third = sieverts ? "pressure" : "humidity";
    nk_layout_row_dynamic(ctx, 22, 4);
    for (String key : List.of("duration", "temperature", third)) {
      w.field(at + " " + key, CaseValues.rampText(seg.path(key)))
          .ifPresent(t -> d.set(at.child(key), t));
    }
    if (w.button("remove " + at, "remove")) {
      env.remove(at);
    }
  }

  /** Temperatures in °C at even times, then the end time in s (see DraftCheck). */
  private void plot(double[] curve) {
    var ctx = w.ctx();
    int n = curve.length - 1;
    double end = curve[n];
    TimeAxis axis = TimeAxis.forEnd(end);
    double[] x = new double[n];
    double[] t = java.util.Arrays.copyOf(curve, n);
    for (int i = 0; i < n; i++) {
      x[i] = end * i / (n - 1.0) / axis.seconds();
    }
    nk_layout_row_dynamic(ctx, 18, 1);
    nk_label(ctx, "Exposure history over " + Annotations.time(end), NK_TEXT_LEFT);
    AxesPlot.draw(
        ctx,
        150,
        x,
        List.of(t),
        new int[] {0xe07a4a},
        "time [" + axis.unit() + "]",
        "temperature [°C]");
  }
}
