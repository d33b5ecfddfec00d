-- The company's limits become one object (README decision 038): the evacuation target and the
-- pressure test's allowed drop, kept until now as keys of their own in organisations.settings,
-- move into settings.procedureLimits as evacuation.targetMicrons and pressureHold.allowedDropKPa.
-- A figure already under procedureLimits gives way to the one the owner set through the API.
UPDATE "organisations"
SET "settings" = ("settings" - 'evacuationTargetMicrons' - 'pressureTestAllowedDropKPa')
  || jsonb_build_object(
    'procedureLimits',
    coalesce("settings" -> 'procedureLimits', '{}'::jsonb)
      || CASE WHEN jsonb_typeof("settings" -> 'evacuationTargetMicrons') = 'number' THEN jsonb_build_object(
        'evacuation',
        coalesce("settings" -> 'procedureLimits' -> 'evacuation', '{}'::jsonb)
          || jsonb_build_object('targetMicrons', "settings" -> 'evacuationTargetMicrons')
      ) ELSE '{}'::jsonb END
      || CASE WHEN jsonb_typeof("settings" -> 'pressureTestAllowedDropKPa') = 'number' THEN jsonb_build_object(
        'pressureHold',
        jsonb_build_object('allowedDropKPa', "settings" -> 'pressureTestAllowedDropKPa')
      ) ELSE '{}'::jsonb END
  )
WHERE "settings" ? 'evacuationTargetMicrons' OR "settings" ? 'pressureTestAllowedDropKPa';
