/** The Batteries area: fleet, chargers, plan. (Being built.) */
export function BatteriesRoute() {
  return <p>Batteries</p>;
}

/** One battery: readings, trends, log a reading. (Being built.) */
export function BatteryRoute() {
  return <p>Battery</p>;
}

/** Printable labels, one per battery. (Being built.) */
export function BatteryLabelsRoute() {
  return <p>Labels</p>;
}
