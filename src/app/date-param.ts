import { LocalDateSchema } from '@shared/schemas/common.schemas';

/** The `?date=YYYY-MM-DD` of a day page; anything else means "today" (the server decides which day that is). */
export function dateParam(search: URLSearchParams): string | undefined {
  const parsed = LocalDateSchema.safeParse(search.get('date'));
  return parsed.success ? parsed.data : undefined;
}

export function dateParamOf(request: Request): string | undefined {
  return dateParam(new URL(request.url).searchParams);
}
