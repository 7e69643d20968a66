// `npm run load [-- SECONDS MUSICIANS]`: the longer load run (loopback only, bounded in time).
import { runLoad } from '../bench/load';

const seconds = Number(process.argv[2] ?? 30);
const musicians = Number(process.argv[3] ?? 50);
runLoad({ seconds, musicians, port: 8191 })
  .then((report) => {
    console.table(report);
    const failed = report.errors + report.non2xx + report.lockedAnswers + report.lostWrites + report.duplicateWrites;
    process.exit(failed > 0 ? 1 : 0);
  })
  .catch((error: unknown) => {
    console.error(error);
    process.exit(1);
  });
