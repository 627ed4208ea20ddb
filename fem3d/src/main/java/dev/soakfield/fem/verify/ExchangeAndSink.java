package dev.soakfield.fem.verify;

import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.time.ThetaStepper;
import dev.soakfield.fem.time.TimeSettings;
import dev.soakfield.fem.time.TransientRun;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import java.util.List;
import java.util.Map;

/**
 * Conservation with every kind of term at once: two materials of different solubility, an exchange
 * face, a flux face, a held face and a first-order sink. Whatever the accuracy, the amount gained
 * must equal what came in minus what the sink took, to solver precision.
 */
public final class ExchangeAndSink {
  private ExchangeAndSink() {}

  public static List<Check> run(boolean crankNicolson) {
    TetMesh mesh =
        StructuredMesher.layers(
            1,
            1,
            3,
            3,
            List.of(
                new StructuredMesher.Layer("skin", 0.2, 2),
                new StructuredMesher.Layer("core", 0.8, 6)),
            1);
    DiffusionModel model =
        UniformModels.model(
            mesh,
            new double[] {0.5, 2.0},
            new double[] {2.0, 0.5},
            new double[] {0.0, -0.3},
            0.1,
            Map.of(
                "zmin", UniformModels.Condition.exchange(0.7, 1.5),
                "zmax", UniformModels.Condition.concentration(0.2),
                "xmin", UniformModels.Condition.flux(0.05)));
    ThetaStepper stepper = new ThetaStepper(model, false, 1e-13, 5000);
    TimeSettings settings =
        new TimeSettings(2.0, new double[] {0.5, 2.0}, crankNicolson, 1e-3, Double.NaN, 1e-4, 0.5);
    double[] phi0 = model.initialPhi();
    Recorder rec = new Recorder(stepper.amount(phi0));
    TransientRun.run(stepper, phi0, settings, rec);
    return List.of(
        Check.atMost(
            "two materials, exchange, flux, held face and sink ("
                + (crankNicolson ? "Crank-Nicolson" : "backward Euler")
                + "), global balance",
            "conservation (exact)",
            1e-10,
            rec.balanceRelative()));
  }
}
