/**
 * Each build-up slot's mean temperature from a solved result, so the material picker can show λ
 * where the layer works. Pipe and flat results list their layers with a role (pipe wall, plate,
 * insulation in order, jacket); a wall's list each layer's index in the case and its face
 * temperatures (none where the layer is outside a well ventilated air layer).
 */
const ROLE_SLOT: Readonly<Record<string, string>> = { 'pipe-wall': 'pipe', wall: 'wall', jacket: 'jacket' };

interface LayerLike {
  readonly role?: string;
  readonly meanTemperature?: number;
  readonly index?: number;
  readonly innerTemperature?: number | null;
  readonly outerTemperature?: number | null;
}

export function layerMeansOf(result: unknown): Record<string, number> {
  const means: Record<string, number> = {};
  const r = result as { layers?: readonly LayerLike[]; wall?: { layers?: readonly LayerLike[] } } | null;
  const layers = r?.layers ?? r?.wall?.layers ?? [];
  let insulation = 0;
  for (const layer of layers) {
    if (layer.role !== undefined) {
      const slot = layer.role === 'insulation' ? `layers[${insulation++}]` : ROLE_SLOT[layer.role];
      if (slot !== undefined && Number.isFinite(layer.meanTemperature)) means[slot] = layer.meanTemperature!;
    } else if (layer.index !== undefined && typeof layer.innerTemperature === 'number' && typeof layer.outerTemperature === 'number') {
      means[`layers[${layer.index}]`] = (layer.innerTemperature + layer.outerTemperature) / 2;
    }
  }
  return means;
}
