export { insertPoint, deletePoint, duplicatePoint, movePoint, setKind, setLabel, setEnergy, energyProblem, type PointRef } from './pointEdits.ts';
export { insertPathway, deletePathway, duplicatePathway, movePathway, setPathwayName, setCycle, setStyle } from './pathwayEdits.ts';
export { setSettings, settingsProblem, setFigure, setTitle } from './settingsEdits.ts';
export { setPointX, setLabelOffset } from './layoutEdits.ts';
export { dragEnergy, dragBlockedReason } from './dragEnergy.ts';
export { addSpecies, deleteSpecies, speciesUsers, setSpeciesCell, pasteSpecies, writeSpeciesRows, type SheetEdit, type SheetError } from './speciesEdits.ts';
export { SPECIES_COLUMNS, speciesRow, columnByName, type SpeciesColumn, type SpeciesColumnKey, type SpeciesRow } from './speciesColumns.ts';
export { startHistory, record, undo, redo, closeGroup, HISTORY_LIMIT, type History, type RecordOptions } from './history.ts';
export { uniqueId } from './uniqueId.ts';
