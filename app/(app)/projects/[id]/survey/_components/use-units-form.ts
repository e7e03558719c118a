"use client";
import { useEffect, useMemo, useRef } from "react";
import { useForm, type DefaultValues, type FieldValues, type Resolver } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { z } from "zod";
import type { UnitSystem } from "@/lib/tank/units";

/**
 * A form that holds text in the person's units over a record stored in SI. Validation converts to
 * SI and runs the server's own schema; switching units keeps what was typed, re-shown in the new units.
 */
export function useUnitsForm<V extends FieldValues, S>(opts: {
  schema: z.ZodType<FieldValues, FieldValues>;
  stored: S | null;
  system: UnitSystem;
  toForm: (si: S | null, system: UnitSystem) => V;
  fromForm: (values: V, system: UnitSystem, stored: S | null) => unknown;
}) {
  const { schema, stored, system, toForm, fromForm } = opts;
  const storedRef = useRef(stored);
  useEffect(() => {
    storedRef.current = stored;
  });
  const resolver = useMemo<Resolver<V>>(
    () => async (values, ctx, options) => zodResolver(schema)(fromForm(values, system, storedRef.current) as never, ctx, options as never) as never,
    [schema, fromForm, system],
  );
  const form = useForm<V>({ resolver, mode: "onBlur", defaultValues: toForm(stored, system) as DefaultValues<V> });

  const { getValues, reset } = form;
  const shownSystem = useRef(system);
  useEffect(() => {
    if (shownSystem.current === system) return;
    reset(toForm(fromForm(getValues(), shownSystem.current, storedRef.current) as S, system));
    shownSystem.current = system;
  }, [system, getValues, reset, toForm, fromForm]);
  return form;
}
