package dev.soakfield.sweep.spark;

import dev.soakfield.fem.sweep.CaseRow;
import dev.soakfield.fem.sweep.CaseRunner;
import dev.soakfield.fem.sweep.PlannedCase;
import dev.soakfield.fem.sweep.SweepJob;
import java.io.Serializable;
import java.util.ArrayList;
import scala.collection.Iterator;
import scala.runtime.AbstractFunction1;

/**
 * What one Spark task does with its share of the cases, on the executor: a row per case, through
 * the same {@link CaseRunner} the local engine uses. Only the job (text and numbers) and the
 * shipped files' names travel with it.
 */
@SuppressWarnings("NonApiType") // an ArrayList: Spark sends the result back serialized
final class PartitionTask extends AbstractFunction1<Iterator<PlannedCase>, ArrayList<CaseRow>>
    implements Serializable {
  private static final long serialVersionUID = 1L;

  private final SweepJob job;
  private final ShippedFiles files;

  PartitionTask(SweepJob job, ShippedFiles files) {
    this.job = job;
    this.files = files;
  }

  @Override
  public ArrayList<CaseRow> apply(Iterator<PlannedCase> cases) {
    CaseRunner runner = ExecutorRunners.forSweep(job, files);
    ArrayList<CaseRow> rows = new ArrayList<>();
    while (cases.hasNext()) {
      rows.add(runner.run(cases.next()));
    }
    return rows;
  }
}
