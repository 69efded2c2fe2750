import { mount } from 'svelte';
import App from './App.svelte';
import './styles.css';

const target = document.getElementById('app');
if (!target) throw new Error('The page has no #app element to mount Lamina into.');
mount(App, { target });
