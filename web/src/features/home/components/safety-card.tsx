import AcUnitOutlined from '@mui/icons-material/AcUnitOutlined';
import GrainOutlined from '@mui/icons-material/GrainOutlined';
import LocalFireDepartmentOutlined from '@mui/icons-material/LocalFireDepartmentOutlined';
import ReportOutlined from '@mui/icons-material/ReportOutlined';
import StorefrontOutlined from '@mui/icons-material/StorefrontOutlined';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemIcon from '@mui/material/ListItemIcon';
import ListItemText from '@mui/material/ListItemText';
import Typography from '@mui/material/Typography';

// The cautions from the product brief, in a baker's words. They defer to local rules on purpose.
const CAUTIONS = [
  {
    icon: ReportOutlined,
    text: 'Pink, orange or fuzzy growth on a culture means it goes in the bin — it can’t be rescued.',
  },
  {
    icon: GrainOutlined,
    text: 'Raw flour and raw dough aren’t ready to eat. Save the tasting for after the bake.',
  },
  {
    icon: AcUnitOutlined,
    text: 'Doughs and fillings with milk, butter or eggs: keep their time at room temperature short and refrigerate leftovers.',
  },
  {
    icon: LocalFireDepartmentOutlined,
    text: 'Hot ovens, pans and sugar burn. Keep mitts at hand.',
  },
  {
    icon: StorefrontOutlined,
    text: 'Selling your bakes? Local cottage-food and labelling rules apply, including allergens such as wheat and milk.',
  },
] as const;

export function SafetyCard() {
  return (
    <Card component="section" aria-labelledby="safety-heading">
      <CardContent>
        <Typography id="safety-heading" variant="h3" gutterBottom>
          Safe baking, briefly
        </Typography>
        <List dense disablePadding>
          {CAUTIONS.map(({ icon: Icon, text }) => (
            <ListItem key={text} disableGutters alignItems="flex-start">
              <ListItemIcon sx={{ minWidth: 36, mt: 0.25, color: 'primary.main' }}>
                <Icon fontSize="small" />
              </ListItemIcon>
              <ListItemText primary={text} slotProps={{ primary: { variant: 'body2' } }} />
            </ListItem>
          ))}
        </List>
        <Typography variant="body2" color="text.secondary" sx={{ mt: 1 }}>
          Peakwise offers guidance and certifies nothing. Your local food-safety codes and licensed practice come first.
        </Typography>
      </CardContent>
    </Card>
  );
}
