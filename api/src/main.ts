import { createApp } from './app.factory.js';
import { loadConfig } from './config.js';

const config = loadConfig();
const { app, logger } = await createApp(config);
app.enableShutdownHooks(['SIGINT', 'SIGTERM']);
await app.listen({ host: config.host, port: config.port });
logger.info({ url: `http://${config.host}:${config.port}` }, 'Peakwise API listening');
