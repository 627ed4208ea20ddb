package dev.soakfield.ui;

import dev.soakfield.app.PngFile;
import dev.soakfield.app.WorkbenchModel;
import dev.soakfield.render.GlSurface;
import dev.soakfield.render.OffscreenPicture;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;
import org.lwjgl.util.tinyfd.TinyFileDialogs;

/** Saves the view as shown, or every frame of the results, as PNG pictures of the view's size. */
final class PictureExport {
  private final GlSurface surface;
  private final WorkbenchModel model;
  private final ViewLayout layout;

  PictureExport(GlSurface surface, WorkbenchModel model, ViewLayout layout) {
    this.surface = surface;
    this.model = model;
    this.layout = layout;
  }

  /** The view alone, as shown now. */
  BufferedImage pictureOfView() {
    try (OffscreenPicture pic = new OffscreenPicture(layout.width(), layout.height())) {
      BufferedImage img = pic.render(model.scene(), model.camera());
      surface.bind();
      return img;
    }
  }

  /** Asks for a file and saves the view there. */
  void savePicture() {
    String f =
        TinyFileDialogs.tinyfd_saveFileDialog("Save picture", "view.png", null, "PNG picture");
    if (f == null) {
      return;
    }
    try {
      PngFile.write(pictureOfView(), Path.of(f));
      model.notes().add("saved " + f);
    } catch (IOException | RuntimeException e) {
      model.notes().add("could not save " + f + ": " + e.getMessage());
    }
  }

  /** Asks for a folder and saves every frame there as frame_NNNN.png. */
  void saveFrames() {
    String dir = TinyFileDialogs.tinyfd_selectFolderDialog("Folder for the frames", "");
    if (dir == null) {
      return;
    }
    int keep = model.settings().frame();
    try (OffscreenPicture pic = new OffscreenPicture(layout.width(), layout.height())) {
      int frames = model.study().results().orElseThrow().frameCount();
      for (int i = 0; i < frames; i++) {
        model.settings().frame(i);
        model.scene().update();
        Path file = Path.of(dir, String.format(Locale.ROOT, "frame_%04d.png", i));
        PngFile.write(pic.render(model.scene(), model.camera()), file);
      }
      model.notes().add("saved " + frames + " frames in " + dir);
    } catch (IOException | RuntimeException e) {
      model.notes().add("could not save the frames: " + e.getMessage());
    } finally {
      model.settings().frame(keep);
      surface.bind();
    }
  }
}
