import { metresToFeet } from '@seamwright/takeoff';
import { Button } from '../../../components/ui/button';
import { useUnits } from '../../../lib/units';
import type { UnderlayControls } from '../hooks/use-underlay';

/** Moving and turning the photo, by buttons so the keyboard and a finger both work. */
export function UnderlayPosition({ controls }: { controls: UnderlayControls }) {
  const units = useUnits();
  const { local } = controls;
  const step = units.system === 'metric' ? metresToFeet(0.25) : 1;
  const move = (dx: number, dy: number, words: string) =>
    controls.changeLocal(
      { ...local, offsetFt: { x: local.offsetFt.x + dx * step, y: local.offsetFt.y + dy * step } },
      `Photo moved ${units.length(step)} ${words}.`,
    );
  const turn = (deg: number) => {
    const rotationDeg = Math.round(((((local.rotationDeg + deg + 180) % 360) + 360) % 360) - 180);
    controls.changeLocal(
      { ...local, rotationDeg },
      `Photo turned to ${rotationDeg}° ${rotationDeg >= 0 ? 'anticlockwise' : 'clockwise'}.`,
    );
  };
  return (
    <div className="flex flex-col gap-2 border-t border-line pt-3">
      <div role="group" aria-label="Move the photo" className="flex flex-wrap gap-2">
        <span className="w-full text-sm font-semibold">Move by {units.length(step)}</span>
        <Button variant="secondary" onClick={() => move(0, 1, 'north')}>
          North
        </Button>
        <Button variant="secondary" onClick={() => move(0, -1, 'south')}>
          South
        </Button>
        <Button variant="secondary" onClick={() => move(1, 0, 'east')}>
          East
        </Button>
        <Button variant="secondary" onClick={() => move(-1, 0, 'west')}>
          West
        </Button>
      </div>
      <div role="group" aria-label="Turn the photo" className="flex flex-wrap items-center gap-2">
        <span className="w-full text-sm font-semibold">Turn (now {local.rotationDeg}°)</span>
        <Button variant="secondary" aria-label="Turn 15° anticlockwise" onClick={() => turn(15)}>
          ↺ 15°
        </Button>
        <Button variant="secondary" aria-label="Turn 1° anticlockwise" onClick={() => turn(1)}>
          ↺ 1°
        </Button>
        <Button variant="secondary" aria-label="Turn 1° clockwise" onClick={() => turn(-1)}>
          ↻ 1°
        </Button>
        <Button variant="secondary" aria-label="Turn 15° clockwise" onClick={() => turn(-15)}>
          ↻ 15°
        </Button>
      </div>
    </div>
  );
}
