/** Entry point of the workbench page. */
import './components/fw-app.ts';
