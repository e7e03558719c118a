import { checkLength, checkOrder, checkPh, checkPredation, checkReef, checkShoaling, checkTemperament, checkTemperature, checkWaterKind, type PlanLine, type StockingWarning, type TankFacts } from "./checks";
import { checkBioload } from "./bioload";

/** Every check on a plan, warnings before notes. */
export function checkPlan(lines: PlanLine[], tank: TankFacts): StockingWarning[] {
  const all = [
    ...checkWaterKind(lines, tank),
    ...checkTemperature(lines, tank),
    ...checkPh(lines, tank),
    ...checkLength(lines, tank),
    ...checkTemperament(lines),
    ...checkPredation(lines),
    ...checkShoaling(lines),
    ...checkReef(lines, tank),
    ...checkBioload(lines, tank),
    ...checkOrder(lines),
  ];
  return [...all.filter((w) => w.severity === "warning"), ...all.filter((w) => w.severity === "note")];
}
