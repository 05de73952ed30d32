import express from 'express';

/** A bare Express route returning fixed JSON: the yardstick for the gateway's throughput. */
const app = express();
const body = { status: 'ok', levels: 9, columns: 3, opening: 6.625 };
app.post('/bare', express.json(), (_req, res) => {
  res.json(body);
});
const port = Number(process.argv[2] ?? 4390);
app.listen(port, '127.0.0.1', () => console.log(`bare on ${port}`));
