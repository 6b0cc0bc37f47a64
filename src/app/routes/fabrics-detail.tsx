import { useCallback, useRef, useState } from 'react';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import type { UseFormReturn } from 'react-hook-form';
import type { FabricCreate, FabricView, Recovery } from '@shared/schemas/fabric';
import { Alert } from '@/components/ui/alert';
import { ButtonLink } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { LoadingState } from '@/components/ui/loading-state';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { OwnersOnly } from '@/features/auth/components/owners-only';
import { isOwner, useMember } from '@/features/auth/hooks/use-member';
import { fabricQueryOptions, useFabric } from '@/features/fabrics/api/get-fabric';
import { fabricConflictCurrent, useSaveFabric } from '@/features/fabrics/api/save-fabric';
import { EaseRecommendation } from '@/features/fabrics/components/ease-recommendation';
import { FabricConflict } from '@/features/fabrics/components/fabric-conflict';
import { FabricForm, type FabricFormValues } from '@/features/fabrics/components/fabric-form';
import { FabricSummary } from '@/features/fabrics/components/fabric-summary';
import { StretchTest } from '@/features/fabrics/components/stretch-test';
import { fabricFormEmpty, fabricFormValues, fabricSaveValues } from '@/features/fabrics/lib/fabric-values';
import { FabricSwatch } from '@/features/photos/components/fabric-swatch';
import { UnitSwitch } from '@/features/units/components/unit-switch';
import { queryClient } from '@/lib/query-client';
import { useDisplayUnit } from '@/lib/unit';

function fabricIdParam(raw: string | undefined): number {
  const id = Number(raw);
  if (!Number.isInteger(id) || id < 1) throw new Response('No such fabric', { status: 404, statusText: 'No such fabric' });
  return id;
}

export async function fabricLoader({ params }: LoaderFunctionArgs) {
  await queryClient.ensureQueryData(fabricQueryOptions(fabricIdParam(params.fabricId)));
  return null;
}

export function FabricNewRoute() {
  return (
    <OwnersOnly what="Adding fabrics">
      <FabricEditor fabric={null} />
    </OwnersOnly>
  );
}

export function FabricRoute() {
  const id = fabricIdParam(useParams().fabricId);
  const owner = isOwner(useMember());
  const unit = useDisplayUnit();
  const fabric = useFabric(id);
  if (fabric.isPending) return <LoadingState>Loading the fabric…</LoadingState>;
  if (fabric.isError)
    return (
      <Alert tone="error" title="This fabric could not be loaded">
        {fabric.error.message}
      </Alert>
    );
  if (owner) return <FabricEditor key={fabric.data.id} fabric={fabric.data} />;
  return (
    <div>
      <Header title={fabric.data.name} />
      <div className="grid gap-6 lg:grid-cols-2">
        <FabricSummary fabric={fabric.data} unit={unit} />
        <EaseRecommendation stretchPct={fabric.data.stretchCrosswise} recovery={fabric.data.recovery} unit={unit} />
        <FabricSwatch fabricId={fabric.data.id} fabricName={fabric.data.name} canEdit={false} />
      </div>
    </div>
  );
}

function Header({ title }: { title: string }) {
  return (
    <PageHeader
      eyebrow={
        <ButtonLink to={paths.fabrics.href()} variant="ghost" compact className="-ml-3">
          ← Fabrics
        </ButtonLink>
      }
      title={title}
      actions={<UnitSwitch />}
    />
  );
}

/** The fabric form beside the stretch test and the ease it leads to; a stale save shows both copies. */
function FabricEditor({ fabric }: { fabric: FabricView | null }) {
  const unit = useDisplayUnit();
  const navigate = useNavigate();
  const formRef = useRef<UseFormReturn<FabricFormValues, unknown, FabricCreate> | null>(null);
  const [stretch, setStretch] = useState<{ pct: number | null; recovery: Recovery | null }>({
    pct: fabric?.stretchCrosswise ?? null,
    recovery: fabric?.recovery ?? 'good',
  });
  const [baseVersion, setBaseVersion] = useState(fabric?.version ?? 0);
  const [conflict, setConflict] = useState<{ mine: FabricFormValues; current: FabricView } | null>(null);
  const [resetTo, setResetTo] = useState<FabricFormValues | null>(null);
  const [saved, setSaved] = useState(false);
  const save = useSaveFabric(fabric?.id ?? null, {
    onSuccess: (f) => {
      setConflict(null);
      setBaseVersion(f.version);
      if (fabric) setSaved(true);
      else void navigate(paths.fabric.href(f.id), { replace: true });
    },
  });

  const submit = async (values: FabricFormValues, version: number) => {
    setSaved(false);
    try {
      await save.mutateAsync({ ...fabricSaveValues(values, unit, fabric ?? undefined), version });
    } catch (error) {
      const current = fabricConflictCurrent(error);
      if (!current) throw error;
      setConflict({ mine: values, current });
    }
  };

  const onStretchChange = useCallback((pct: number | null, recovery: Recovery | null) => setStretch({ pct, recovery }), []);
  const onReady = useCallback((form: UseFormReturn<FabricFormValues, unknown, FabricCreate>) => {
    formRef.current = form;
  }, []);

  return (
    <div>
      <Header title={fabric ? fabric.name : 'Add a fabric'} />
      <div className="grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <Card title="Fabric">
          {saved && (
            <Alert tone="success" className="mb-4">
              Saved.
            </Alert>
          )}
          <FabricForm
            defaultValues={fabric ? fabricFormValues(fabric, unit) : fabricFormEmpty()}
            unit={unit}
            resetTo={resetTo}
            submitLabel={fabric ? 'Save fabric' : 'Add fabric'}
            onSubmit={(values) => submit(values, baseVersion)}
            onReady={onReady}
            onStretchChange={onStretchChange}
            notice={
              conflict && (
                <>
                  <FabricConflict
                    mine={conflict.mine}
                    current={conflict.current}
                    unit={unit}
                    pending={save.isPending}
                    onKeepMine={() => void submit(conflict.mine, conflict.current.version).catch(() => undefined)}
                    onTakeTheirs={() => {
                      setBaseVersion(conflict.current.version);
                      setResetTo(fabricFormValues(conflict.current, unit));
                      setConflict(null);
                    }}
                  />
                  {save.error && !fabricConflictCurrent(save.error) && (
                    <Alert tone="error" title="Not saved">
                      {save.error.message}
                    </Alert>
                  )}
                </>
              )
            }
          />
        </Card>
        <div className="flex flex-col gap-6">
          <StretchTest
            unit={unit}
            onUse={(direction, percent) =>
              formRef.current?.setValue(direction === 'crosswise' ? 'stretchCrosswise' : 'stretchLengthwise', percent, {
                shouldDirty: true,
                shouldValidate: true,
              })
            }
          />
          <EaseRecommendation stretchPct={stretch.pct} recovery={stretch.recovery} unit={unit} />
          {fabric && <FabricSwatch fabricId={fabric.id} fabricName={fabric.name} canEdit />}
        </div>
      </div>
    </div>
  );
}
