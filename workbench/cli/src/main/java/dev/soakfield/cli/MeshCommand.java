package dev.soakfield.cli;

import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.Grading;
import dev.soakfield.mesh.gen.StructuredMesher;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code soakfield mesh SHAPE ...}: structured tetrahedral meshes of simple shapes. */
@Command(
    name = "mesh",
    mixinStandardHelpOptions = true,
    description = {
      "Makes a tetrahedral mesh of a simple shape, with named volume and face groups.",
      "Lengths are metres unless a unit follows (m, cm, mm, um, in)."
    },
    subcommands = {
      MeshCommand.Box.class,
      MeshCommand.Layers.class,
      MeshCommand.Block.class,
      MeshCommand.Cylinder.class,
      MeshCommand.Pipe.class
    })
final class MeshCommand implements Runnable {
  @Spec CommandSpec spec;

  @Override
  public void run() {
    spec.commandLine().usage(spec.commandLine().getOut());
  }

  /** Shared plumbing of the shape commands: build the mesh, write it. */
  abstract static class Shape implements Callable<Integer> {
    @Spec CommandSpec spec;
    @Mixin MeshOutput output;

    abstract TetMesh build();

    /** What the shape changed from the request (raised cell counts), or empty. */
    String note() {
      return "";
    }

    @Override
    public Integer call() throws Exception {
      TetMesh mesh;
      try {
        mesh = build();
      } catch (IllegalArgumentException e) {
        // a refusal after raising the counts (mesh size) says so, or the user sees no reason
        throw new UserInputException(
            note().isEmpty() ? e.getMessage() : e.getMessage() + " (" + note() + ")");
      }
      if (!note().isEmpty()) {
        spec.commandLine().getOut().println(note());
      }
      output.write(mesh, spec.commandLine().getOut());
      return ExitCodes.OK;
    }
  }

  @Command(
      name = "box",
      mixinStandardHelpOptions = true,
      description = {
        "A box from the origin; face groups xmin, xmax, ymin, ymax, zmin, zmax; volume group body.",
        "Each cell is split into six tetrahedra."
      })
  static final class Box extends Shape {
    @Option(
        names = "--size",
        required = true,
        paramLabel = "LX,LY,LZ",
        description = "Edge lengths, e.g. 0.01,0.01,0.002 or 10mm,10mm,2mm.")
    String size;

    @Option(
        names = "--cells",
        required = true,
        paramLabel = "NX,NY,NZ",
        description = "Cells along x, y and z.")
    String cells;

    @Mixin GradeOption grade;

    @Override
    TetMesh build() {
      double[] l = Lengths.parseList(size, 3, "--size");
      int[] n = Lengths.parseCounts(cells, 3, "--cells");
      return StructuredMesher.box(
          l[0],
          l[1],
          l[2],
          n[0],
          n[1],
          n[2],
          output.order(),
          grade.grading(StructuredMesher.BOX_FACES, "box"));
    }
  }

  @Command(
      name = "layers",
      mixinStandardHelpOptions = true,
      description = {
        "A stack of named layers along z (a composite wall or a laminate).",
        "Face groups xmin ... zmax; each layer a volume group; each joint between layers an"
            + " interface face group."
      })
  static final class Layers extends Shape {
    @Option(
        names = "--size",
        required = true,
        paramLabel = "LX,LY",
        description = "In-plane edge lengths.")
    String size;

    @Option(
        names = "--cells",
        required = true,
        paramLabel = "NX,NY",
        description = "In-plane cells along x and y.")
    String cells;

    @Option(
        names = "--layer",
        required = true,
        paramLabel = "NAME:THICKNESS:CELLS",
        description = "One layer, bottom first; repeat the option for each layer.")
    List<String> layers;

    @Override
    TetMesh build() {
      double[] l = Lengths.parseList(size, 2, "--size");
      int[] n = Lengths.parseCounts(cells, 2, "--cells");
      List<StructuredMesher.Layer> stack = new ArrayList<>();
      for (String spec : layers) {
        String[] p = spec.split(":", -1);
        if (p.length != 3 || p[0].isBlank()) {
          throw new UserInputException(
              "--layer: found '" + spec + "', expected NAME:THICKNESS:CELLS such as mold:1.5mm:6");
        }
        stack.add(
            new StructuredMesher.Layer(
                p[0].trim(),
                Lengths.parse(p[1], "--layer " + p[0]),
                Lengths.parseCount(p[2], "--layer " + p[0])));
      }
      return StructuredMesher.layers(l[0], l[1], n[0], n[1], stack, output.order());
    }
  }

  @Command(
      name = "block",
      mixinStandardHelpOptions = true,
      description = {
        "A box with named boxes inside it (a part inside a part, such as a die in a mould).",
        "Cells whose centres lie in an insert belong to it; its boundary is the interface face"
            + " group NAME-surface."
      })
  static final class Block extends Shape {
    @Option(names = "--size", required = true, paramLabel = "LX,LY,LZ", description = "Box size.")
    String size;

    @Option(
        names = "--cells",
        required = true,
        paramLabel = "NX,NY,NZ",
        description = "Cells along x, y and z.")
    String cells;

    @Option(
        names = "--insert",
        required = true,
        paramLabel = "NAME:X0,Y0,Z0:X1,Y1,Z1",
        description = "A named box inside, by two opposite corners; repeat for more.")
    List<String> inserts;

    @Override
    TetMesh build() {
      double[] l = Lengths.parseList(size, 3, "--size");
      int[] n = Lengths.parseCounts(cells, 3, "--cells");
      List<StructuredMesher.Insert> list = new ArrayList<>();
      for (String spec : inserts) {
        String[] p = spec.split(":", -1);
        if (p.length != 3 || p[0].isBlank()) {
          throw new UserInputException(
              "--insert: found '"
                  + spec
                  + "', expected NAME:X0,Y0,Z0:X1,Y1,Z1 such as die:2mm,2mm,1mm:8mm,8mm,2mm");
        }
        double[] a = Coordinates.parse(p[1], "--insert " + p[0]);
        double[] b = Coordinates.parse(p[2], "--insert " + p[0]);
        list.add(new StructuredMesher.Insert(p[0].trim(), a[0], a[1], a[2], b[0], b[1], b[2]));
      }
      return StructuredMesher.block(l[0], l[1], l[2], n[0], n[1], n[2], list, output.order());
    }
  }

  @Command(
      name = "cylinder",
      mixinStandardHelpOptions = true,
      description = "A solid cylinder on the z axis; face groups side, bottom, top.")
  static final class Cylinder extends Shape {
    @Option(names = "--radius", required = true, paramLabel = "R", description = "Radius.")
    String radius;

    @Option(names = "--height", required = true, paramLabel = "H", description = "Height (z).")
    String height;

    @Option(
        names = "--cells",
        required = true,
        paramLabel = "NR,NA,NZ",
        description = "Cells across the radius, around the circumference, and along z.")
    String cells;

    @Mixin GradeOption grade;

    @Mixin RoundCells round;

    @Override
    TetMesh build() {
      int[] n = Lengths.parseCounts(cells, 3, "--cells");
      double r = Lengths.parse(radius, "--radius");
      double h = Lengths.parse(height, "--height");
      Grading grading = grade.grading(StructuredMesher.CYLINDER_FACES, "cylinder");
      round.settle(
          n, () -> StructuredMesher.cylinderCells(r, h, n[0], n[1], n[2], grading, round.asGiven));
      return StructuredMesher.cylinder(
          r, h, n[0], n[1], n[2], output.order(), grading, round.asGiven);
    }

    @Override
    String note() {
      return round.note();
    }
  }

  @Command(
      name = "pipe",
      mixinStandardHelpOptions = true,
      description = "A pipe (annulus) on the z axis; face groups inner, outer, bottom, top.")
  static final class Pipe extends Shape {
    @Option(
        names = "--inner-radius",
        required = true,
        paramLabel = "RI",
        description = "Inner radius.")
    String inner;

    @Option(
        names = "--outer-radius",
        required = true,
        paramLabel = "RO",
        description = "Outer radius.")
    String outer;

    @Option(names = "--height", required = true, paramLabel = "H", description = "Height (z).")
    String height;

    @Option(
        names = "--cells",
        required = true,
        paramLabel = "NR,NA,NZ",
        description = "Cells through the wall, around the circumference, and along z.")
    String cells;

    @Mixin GradeOption grade;

    @Mixin RoundCells round;

    @Override
    TetMesh build() {
      int[] n = Lengths.parseCounts(cells, 3, "--cells");
      double ri = Lengths.parse(inner, "--inner-radius");
      double ro = Lengths.parse(outer, "--outer-radius");
      double h = Lengths.parse(height, "--height");
      Grading grading = grade.grading(StructuredMesher.PIPE_FACES, "pipe");
      round.settle(
          n, () -> StructuredMesher.pipeCells(ri, ro, h, n[0], n[1], n[2], grading, round.asGiven));
      return StructuredMesher.pipe(
          ri, ro, h, n[0], n[1], n[2], output.order(), grading, round.asGiven);
    }

    @Override
    String note() {
      return round.note();
    }
  }
}
