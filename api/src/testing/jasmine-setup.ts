import 'reflect-metadata';
import { installCountingReporter } from './counting-reporter';

installCountingReporter(process.env.KELVINDEX_SUITE ?? 'api');
jasmine.DEFAULT_TIMEOUT_INTERVAL = 30_000;
