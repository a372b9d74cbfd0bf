import { DEFAULT_PORT } from '../serve/bindPolicy.ts';
import { UsageError, type CommandModule } from './commandTypes.ts';

export const serveCommand: CommandModule = {
  command: 'serve [spec]',
  describe: 'open a local page to shape the dial, watch its shadow and download the files (127.0.0.1 only)',
  builder: (y) =>
    y
      .positional('spec', { type: 'string', describe: 'dial spec to open; "save spec" on the page writes only this file (created if missing)' })
      .option('port', { type: 'number', default: DEFAULT_PORT, describe: 'TCP port (0: any free port)' })
      .option('host', { type: 'string', default: '127.0.0.1', describe: 'address to listen on; anything but loopback also needs --allow-remote' })
      .option('allow-remote', { type: 'boolean', default: false, describe: 'allow a non-loopback --host (the page has no login: anyone who can reach it can use it)' })
      .option('allowed-host', { type: 'string', array: true, describe: 'with --allow-remote: a host name the page is reached by, besides IP addresses and localhost (repeatable; "*" turns the Host check off)' }),
  run: async (args, io) => {
    const port = args.port;
    if (!Number.isInteger(port) || port < 0 || port > 65535) throw new UsageError(`--port: got ${args.port}; allowed: a whole number from 0 to 65535`);
    const { startServer } = await import('../serve/startServer.ts'); // the server and the whole build: loaded only when the command runs
    let server;
    try {
      server = await startServer({ specPath: args.spec, host: args.host, port, allowRemote: args.allowRemote, allowedHosts: args.allowedHost, log: io.err });
    } catch (e) {
      const code = (e as NodeJS.ErrnoException).code;
      if (code === 'EADDRINUSE') throw new UsageError(`--port: ${port} is already in use; allowed: a free port, e.g. --port ${port + 1} (or 0 for any)`);
      if (code === 'EADDRNOTAVAIL' || code === 'ENOTFOUND') throw new UsageError(`--host: ${args.host} is not an address of this machine`);
      throw e;
    }
    const running = server;
    const stopped = new Promise<void>((done) => {
      const stop = () => {
        process.off('SIGINT', stop);
        process.off('SIGTERM', stop);
        void running.close().then(done);
      };
      process.on('SIGINT', stop);
      process.on('SIGTERM', stop);
    });
    if (server.warning) io.err(`umbrafab: ${server.warning}`);
    io.out(`umbrafab: the dial page is at ${server.url} (Ctrl-C to stop)${args.spec ? `; "save spec" writes ${args.spec}` : ''}`);
    await stopped;
    return 0;
  },
};
