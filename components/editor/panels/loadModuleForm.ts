/**
 * The Details form's code (it carries the form libraries), loaded on first need: the Details
 * panel renders it lazily, and picking up a part from the shelf starts loading it, so the drop
 * that selects the new module does not also fetch and start a script.
 */
export const loadModuleForm = () => import('./ModuleForm');
