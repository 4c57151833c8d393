import { Actuator, InlineValve, type SymbolProps } from "../symbol-kit";

/** Motorised two-port valve: bow-tie with an actuator; drawn filled when set closed. */
export function ZoneValveSymbol({ w, h, props }: SymbolProps) {
  return (
    <>
      <Actuator cx={w / 2} top={6} stemTo={h / 2} />
      <InlineValve w={w} h={h} closed={props.open === false} />
    </>
  );
}
