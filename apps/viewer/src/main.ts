// Entry point: installs the drawing's stylesheet (shared with the SVG export) and mounts the app.
import { mount } from 'svelte';
import { DRAWING_CSS } from '@bulkhead/layout';
import App from './App.svelte';
import './app.css';

const style = document.createElement('style');
style.textContent = DRAWING_CSS;
document.head.append(style);

const target = document.getElementById('app');
if (!target) throw new Error('the page has no #app element');
export default mount(App, { target });
