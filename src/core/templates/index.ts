// Station templates for a new project.
export { TEMPLATE_INFO, TEMPLATE_KEYS, TEMPLATE_OPTIONS, type TemplateKey } from './choices';
export { projectFromTemplate, type TemplateInput } from './build';
