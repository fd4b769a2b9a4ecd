import { mount } from 'svelte';
import App from './App.svelte';
import { DocumentStore } from './state/documentStore.svelte.ts';
import { FigureFont } from './state/figureFont.svelte.ts';
import { HostSession } from './state/hostSession.svelte.ts';
import { ExportRequest } from './state/exportRequest.svelte.ts';
import { DEMO_FILE_NAME, loadDemo } from './demo/demoDocument.ts';
import { pickHost } from './host/pickHost.ts';
import { makeDocument } from '../core/model/load.ts';
import './styles.css';

const demo = loadDemo();
const host = pickHost();
const store = new DocumentStore(host, demo.ok ? demo.doc : makeDocument({ title: '' }), demo.ok ? DEMO_FILE_NAME : 'untitled.passline');
// A broken bundled demo is our bug, but the user still gets a working, empty app.
if (!demo.ok) store.problem = { fileName: DEMO_FILE_NAME, errors: demo.errors };
const font = new FigureFont();
void font.load();

const target = document.getElementById('app');
if (!target) throw new Error('index.html lacks the #app element');
// The export dialog opens from the toolbar, a menu or a shortcut; the session sets this.
const exportRequest = new ExportRequest();
const session = new HostSession(store, host, (kind) => exportRequest.show(kind));
mount(App, { target, props: { store, font, session, exportRequest } });
