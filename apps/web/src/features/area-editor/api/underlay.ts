import type { AreaUnderlayView, ItemResponse, UnderlayScaleInput } from '@seamwright/shared';
import { api } from '../../../lib/api-client';

const base = (areaId: string) => `/areas/${encodeURIComponent(areaId)}/underlay`;

/** `POST /api/areas/:id/underlay`: the photo or sketch, checked by its content on the server. */
export async function uploadUnderlay(areaId: string, file: File): Promise<AreaUnderlayView> {
  const form = new FormData();
  form.append('file', file, file.name);
  return (await api.upload<ItemResponse<AreaUnderlayView>>(base(areaId), form)).data;
}

/** `PUT /api/areas/:id/underlay/scale`: two points on the image, their distance, placement. */
export async function saveUnderlayScale(
  areaId: string,
  input: UnderlayScaleInput,
): Promise<AreaUnderlayView> {
  return (await api.put<ItemResponse<AreaUnderlayView>>(`${base(areaId)}/scale`, input)).data;
}

export async function removeUnderlay(areaId: string): Promise<void> {
  await api.delete(base(areaId));
}
