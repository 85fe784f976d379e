// Moved to core (views import core only); kept as a re-export while pages move to the field specs.
export { inputText, percentText } from '../core/spec/input-text';
