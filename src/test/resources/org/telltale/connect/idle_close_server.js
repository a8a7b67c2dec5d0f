// idle_close_server.js - a plain Node.js http server for Telltale's keep-alive tests.
// Usage: node idle_close_server.js IDLE_MS [builtin]
// Speaks Telltale's native protocol (P(long) = len(text) / (len(text) + 10)). A keep-alive
// connection left idle for IDLE_MS after an answer is destroyed by the server. With "builtin",
// Node's own keep-alive timer does it (server.keepAliveTimeout = IDLE_MS, which Node 20 enforces
// about 1 s later than it advertises); without, a timer of this script does it at IDLE_MS exactly.
// GET /stats answers {"connections": N, "requests": N}.
'use strict';
const http = require('http');

let connections = 0;
let requests = 0;
const server = http.createServer((req, res) => {
  const chunks = [];
  req.on('data', (c) => chunks.push(c));
  req.on('end', () => {
    let body;
    if (req.method === 'GET') {
      body = JSON.stringify({ connections, requests });
    } else {
      requests++;
      const texts = JSON.parse(Buffer.concat(chunks).toString('utf8')).texts;
      const scores = texts.map((t) => { const p = t.length / (t.length + 10); return [1 - p, p]; });
      body = JSON.stringify({ labels: ['short', 'long'], scores });
    }
    res.writeHead(200, { 'Content-Type': 'application/json', 'Content-Length': Buffer.byteLength(body) });
    res.end(body);
  });
});
const idle = Number(process.argv[2] || 5000);
const builtin = process.argv[3] === 'builtin';
server.on('connection', (socket) => {
  connections++;
  if (builtin) {
    return;
  }
  let timer = null;
  socket.armIdle = () => { clearTimeout(timer); timer = setTimeout(() => socket.destroy(), idle); };
  socket.on('data', () => clearTimeout(timer));
  socket.on('close', () => clearTimeout(timer));
});
server.on('request', (req, res) => {
  res.on('finish', () => { if (req.socket.armIdle) req.socket.armIdle(); });
});
server.keepAliveTimeout = builtin ? idle : 0;
server.listen(0, '127.0.0.1', () => {
  console.log('listening on http://127.0.0.1:' + server.address().port);
});
