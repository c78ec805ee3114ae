export { SpeciesEditorForm, type SpeciesEditorFormProps } from './components/species-editor-form.js';
export { SECTIONS as SPECIES_EDITOR_SECTIONS } from './utils/editor-layout.js';
