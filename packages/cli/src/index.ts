export { buildProgram } from './program';
